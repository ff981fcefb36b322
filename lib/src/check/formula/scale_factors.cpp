// Factors written into a formula: trade constants, conversions folded with coefficients,
// factors not needed, applied twice or the wrong way round.
#include "check/formula/checker.hpp"
#include "model/ascii_case.hpp"

namespace plumb::formula_check {

// Asks whether the parts' units reconcile with number k of part i read as another number,
// keeping its buffers between questions. A part with more numbers than it holds is not asked.
class number_swap {
  public:
    static constexpr std::size_t most_numbers = 8;

    // The number read as exactly 1: as if it were not written.
    static scale_literal left_out(const scale_literal& l) {
        scale_literal one = l;
        one.value = 1.0;
        one.tolerance = 0.0;
        one.low = rational(1);
        one.high = rational(1);
        one.power_of_ten = false;
        one.power = 0;
        one.factor_like = false;
        one.table_digits = false;
        return one;
    }

    // The common unit's SI value where they reconcile.
    std::optional<double> unit_with(std::span<const scaled_operand> parts, std::size_t i,
                                    std::size_t k, const scale_literal& as) {
        swap_in(parts, i, k, as);
        const reconciliation r = reconcile(parts_);
        return r.agree ? std::optional<double>(r.unit) : std::nullopt;
    }

    // "T = 9550*P/n*1000", "A = pi*D^2/4e6*1000": read with number k of part i as `as`,
    // whether a power of ten elsewhere could go as well, which the reading would then have
    // hidden, since the units agree with or without it.
    bool leaves_a_spare_power_of_ten(std::span<const scaled_operand> parts, std::size_t i,
                                     std::size_t k, const scale_literal& as) {
        if (parts[i].literals.size() > most_numbers)
            return false;
        for (std::size_t p = 0; p < parts.size(); ++p) {
            if (parts[p].literals.size() > most_numbers)
                continue;
            for (std::size_t q = 0; q < parts[p].literals.size(); ++q) {
                const scale_literal& l = parts[p].literals[q];
                if ((p == i && q == k) || !l.power_of_ten || l.value == 1.0 ||
                    std::abs(l.exponent) != 1.0)
                    continue;
                swap_in(parts, i, k, as);
                if (p == i) {
                    literals_[q] = left_out(l);
                } else {
                    std::copy(parts[p].literals.begin(), parts[p].literals.end(), second_.begin());
                    second_[q] = left_out(l);
                    parts_[p].literals = {second_.data(), parts[p].literals.size()};
                }
                if (reconcile(parts_).agree)
                    return true;
            }
        }
        return false;
    }

  private:
    // The parts with number k of part i read as `as`, in parts_.
    void swap_in(std::span<const scaled_operand> parts, std::size_t i, std::size_t k,
                 const scale_literal& as) {
        std::copy(parts[i].literals.begin(), parts[i].literals.end(), literals_.begin());
        literals_[k] = as;
        parts_.assign(parts.begin(), parts.end());
        parts_[i].literals = {literals_.data(), parts[i].literals.size()};
    }

    std::array<scale_literal, most_numbers> literals_{};
    std::array<scale_literal, most_numbers> second_{};
    std::vector<scaled_operand> parts_;
};

// The power of ten that brings a printed number into a trade constant's range (1 where it
// lies there as printed; a thousand or a million apart only for a property's range), or none.
static std::optional<rational> decade_of_property(const rational& printed,
                                                  const trade_constant& c) {
    try {
        for (const std::int64_t decade : {1, 1000, 1000000})
            for (const rational d : {rational(decade), rational(1, decade)}) {
                if (decade != 1 && c.least == c.greatest)
                    return std::nullopt;
                if (const rational scaled = printed / d;
                    !(scaled < c.least) && !(c.greatest < scaled))
                    return d;
            }
    } catch (const std::exception&) {
        // A printed number too large or too fine for 64-bit fractions is no property.
    }
    return std::nullopt;
}

std::optional<checker::trade_constant_reading>
checker::read_trade_constant(std::span<const scaled_operand> parts, bool flipped) {
    for (std::size_t i = 0; i < parts.size(); ++i)
        for (std::size_t k = 0; k < parts[i].literals.size() && k < 10; ++k) {
            const scale_literal& l = parts[i].literals[k];
            const std::optional<rational> printed = printed_power(l, 1.0);
            if (!printed)
                continue;
            for (const trade_constant& c : trade_constants()) {
                // A property's range is read from a number printed to three digits or more;
                // an exact constant (the 120 of n = 120*f/p) from its value alone. The
                // property's number may be printed a thousand or a million apart: 0.00834 lb
                // per thousand gallons for each mg/L.
                if (!l.factor_like && c.least != c.greatest)
                    continue;
                const std::optional<rational> decade = decade_of_property(*printed, c);
                if (!decade)
                    continue;
                std::vector<scale_literal> literals(parts[i].literals.begin(),
                                                    parts[i].literals.end());
                literals[k].low = c.exact_conversion * *decade;
                literals[k].high = c.conversion_high * *decade;
                literals[k].value = (c.exact_conversion * *decade).to_double();
                literals[k].tolerance = 0.0;
                std::vector<scaled_operand> changed(parts.begin(), parts.end());
                changed[i].literals = literals;
                const reconciliation r = flipped ? reconcile(changed, {i, k}) : reconcile(changed);
                // "W = 8.34*Q*C*1000" from mgd and mg/L: read so, the 1000 beside it is one
                // the units agree without, 1000 times too large.
                if (r.agree && (flipped || !number_swap().leaves_a_spare_power_of_ten(parts, i, k,
                                                                                      literals[k])))
                    return trade_constant_reading{&l, &c, r.unit, *decade};
            }
        }
    return std::nullopt;
}

bool checker::accept_trade_constant(std::span<const scaled_operand> parts, double& unit) {
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
                    format_factor(std::nullopt, (c.exact_conversion * reading->decade).to_double()),
                    c.conversion),
        file_.nodes[l.node].range);
    d.level = severity::note;
    d.notes.push_back({fmt::format("{}; source: {}", c.range_text, c.source), {}});
    d.notes.push_back({std::string(c.caveat), {}});
    return true;
}

// "Q*Δp*6356/η": a trade constant that reconciles the units only written the other way
// round. Said as such, rather than as the ratio of about 6343 that it leaves.
bool checker::report_inverted_trade_constant(std::span<const operand> ops,
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

std::span<const checker::folded_constant> checker::folded_constants() {
    static const std::array<folded_constant, 15> constants{{
        {4.0 / std::numbers::pi, "4/\u03C0", "the area of a circle", false, true},
        {std::numbers::pi / 4.0, "\u03C0/4", "the area of a circle", false, true},
        // 0.000243 = 3 × π/4 / 9702 in³ per bbl in a triplex pump's q = 0.000243·D²·L·E in
        // bbl/stroke from inches (IADC Drilling Manual, from memory; 0.0102 in gal/stroke).
        {3.0 * std::numbers::pi / 4.0, "3\u03C0/4",
         "a triplex pump's three plungers of "
         "area \u03C0\u00B7D\u00B2/4",
         false, true},
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
         "the formula's 2\u03C0 (radians per revolution or per cycle, \u03C9 = "
         "2\u03C0\u00B7f)",
         false},
        // 0.262 = π/12 in the belt maker's V = 0.262*D*n (in and rpm to ft/min), 0.05236 =
        // π/60 in v = π·D·n/60 (m and rpm to m/s): a circumference's π.
        {std::numbers::pi, "\u03C0", "a circumference's \u03C0 (v = \u03C0\u00B7D\u00B7n)", false},
        // 3.82 = 12/π in the machine shop's n = 3.82*V/D (sfm and inches to rpm; Machinery's
        // Handbook, speeds and feeds, from memory): the same π, dividing. Whole numbers of
        // three digits too: 318 = 1000/π (m/min and mm to rpm), 229 = 720/π (a pump's tip
        // speed in ft/s from inches and rpm; common practice).
        {1.0 / std::numbers::pi, "1/\u03C0", "a circumference's \u03C0 (n = V/(\u03C0\u00B7D))",
         true},
        // The well-flow constants only where the formula takes the logarithm they go with
        // (Cooper-Jacob's drawdown per log cycle holds it already): "Q_N = Q_scfm*0.6221" (1.607
        // Nm³/h per scfm applied the wrong way round) is no Thiem constant folded into 1.698.
        {std::numbers::ln10 / (2.0 * std::numbers::pi), "ln 10/(2\u03C0)",
         "the steady well-flow (Thiem) formula's constant, with log10 for ln,", true, false, false,
         false, false, false, true},
        {std::numbers::ln10 / (4.0 * std::numbers::pi), "ln 10/(4\u03C0)",
         "the straight-line (Cooper-Jacob) well-test formula's constant", true},
        // 1055 = 1440 × ln 10/π in the unconfined (Dupuit) well's Q = K(H² - h²)/(1055
        // log10(R/r)) in gpm from gpd/ft², ft (US field form, from memory).
        {std::numbers::ln10 / std::numbers::pi, "ln 10/\u03C0",
         "the unconfined well-flow (Dupuit) formula's constant, with log10 for ln,", true, false,
         false, false, false, false, true},
        // 622 = 0.622 × 1000 in W = 622*p_w/(p - p_w) in g/kg: the molar masses of water
        // and dry air, 18.015/28.965 (ASHRAE Fundamentals, ch. 1, from memory).
        {18.015 / 28.965, "0.622", "the ratio of the molar masses of water and dry air", true,
         false, false, true},
        // 0.463 = 1.486 × 0.3117 in Manning's full-pipe Q = 0.463/n*D^(8/3)*S^(1/2) (cfs, ft):
        // a full circle's area π/4·D² and hydraulic radius D/4 (common practice).
        {std::numbers::pi / 4.0 * std::pow(4.0, -2.0 / 3.0), "(\u03C0/4)\u00B74^(-2/3)",
         "a full pipe's area and hydraulic radius (Manning's full-bore form)", false},
        // 576 = 4 × 144 in A = π*D^2/576 (in² to ft², NIST SP 811 (2008), B.8): a circle's 4
        // beside the π written out and a square; without the π it would hide a missing one.
        {4.0, "4", "the area of a circle (\u03C0\u00B7D\u00B2/4)", true, true, false, false, false,
         true},
    }};
    return constants;
}

// Where a formula's own half or 2 may stand: a square (v²/(2a)), a length from a length
// (a radius from a diameter), or two lengths in one product (the hoop stress p·D/(2t)).
bool checker::may_hold_a_half(const operand& term) const {
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
bool checker::squares_something(std::uint32_t node) const {
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

// "m_yr = m_f*24*330", "E = P*8000" into a year's total: a whole number of days (200 to 366)
// where the units need a year's 365, or of hours (2000 to 8784) where they need its 8760, is
// the days or hours the plant runs in a year (common practice), not a conversion mistaken.
// Read so with a note, where it is the only number standing in for the year.
bool checker::accept_operating_time(std::span<const scaled_operand> parts, double& unit) {
    number_swap swap;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        if (parts[i].literals.size() > number_swap::most_numbers)
            continue;
        for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
            const scale_literal& l = parts[i].literals[k];
            if (l.exponent != 1.0 || l.value != std::round(l.value) ||
                file_.nodes[l.node].kind != expr_kind::number)
                continue;
            const bool days = l.value >= 200.0 && l.value <= 366.0;
            const bool hours = l.value >= 2000.0 && l.value <= 8784.0;
            if (!days && !hours)
                continue;
            scale_literal year = l;
            year.value = days ? 365.0 : 8760.0;
            year.tolerance = days ? 1.0 / 365.0 : 24.0 / 8760.0; // 365 or 366 days
            year.low = rational(days ? 365 : 8760);
            year.high = rational(days ? 366 : 8784);
            year.power_of_ten = false;
            const std::optional<double> reconciled = swap.unit_with(parts, i, k, year);
            if (!reconciled || swap.leaves_a_spare_power_of_ten(parts, i, k, year))
                continue;
            unit = *reconciled;
            diagnostic& d = report(
                rules::trade_constant,
                fmt::format("{} is read as the {} a year the plant runs, in place of the year's "
                            "{}",
                            text(file_.nodes[l.node].range), days ? "days" : "hours",
                            days ? "365 days" : "8760 hours"),
                file_.nodes[l.node].range);
            d.level = severity::note;
            d.notes.push_back({fmt::format("declare it with its unit ({} : {} = {}) to say so",
                                           days ? "n_d" : "t_run", days ? "d/yr" : "h/yr",
                                           text(file_.nodes[l.node].range)),
                               {}});
            return true;
        }
    }
    return false;
}

bool checker::accept_folded_coefficient(std::span<const operand> ops,
                                        std::span<const std::size_t> index,
                                        std::span<const scaled_operand> parts, double& unit) {
    number_swap swap;
    const auto reconciles_with = [&](std::size_t i, std::size_t k, const scale_literal& as) {
        const std::optional<double> reconciled = swap.unit_with(parts, i, k, as);
        if (!reconciled || swap.leaves_a_spare_power_of_ten(parts, i, k, as))
            return false;
        unit = *reconciled;
        return true;
    };
    // Pass 0 reads a power of ten; each later pass one folded constant, in the table's
    // order, over every number, so that the half of 1.075 is found before a 2 in 1.47.
    const std::span<const folded_constant> constants = folded_constants();
    for (std::size_t pass = 0; pass <= constants.size(); ++pass) {
        const bool circle_pass = pass > 0;
        for (std::size_t i = 0; i < parts.size(); ++i) {
            if (parts[i].literals.size() > number_swap::most_numbers)
                continue;
            for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
                const scale_literal& l = parts[i].literals[k];
                if (!(l.value > 0) || !std::isfinite(l.value) || l.value == 1.0 ||
                    file_.nodes[l.node].kind != expr_kind::number)
                    continue;
                scale_literal as = l;
                if (!circle_pass) {
                    // "Δp*V/(24*π)" in lbf·ft from psi and in³: a revolution's 2 beside π,
                    // and 12 in per ft (2 × 60 likewise, from a minute), as 20·π is 2 × 10.
                    // "2*pi*n/30" is the 2 twice: the half reading is for a product with none.
                    const bool half = l.value == 30.0 || l.value == 30000.0;
                    if (const std::optional<scale_literal> twice = twice_a_conversion(l);
                        twice && holds_pi(ops[index[i]].node) &&
                        !(half && holds_number(ops[index[i]].node, 2.0)) &&
                        reconciles_with(i, k, *twice)) {
                        const std::string written(text(file_.nodes[l.node].range));
                        const std::string conversion = format_factor(twice->value);
                        diagnostic& d = report(
                            rules::trade_constant,
                            half ? fmt::format("{} is read as {} \u00F7 2, the {} converting the "
                                               "units and the 2 that of the 2\u03C0 of a "
                                               "revolution",
                                               written, conversion, conversion)
                                 : fmt::format("{} is read as 2 \u00D7 {}, the {} converting the "
                                               "units",
                                               written, conversion, conversion),
                            file_.nodes[l.node].range);
                        d.level = severity::note;
                        return true;
                    }
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
                        diagnostic& d =
                            report(rules::trade_constant,
                                   fmt::format("{} is read as {} \u00D7 {}, the {} converting the "
                                               "units",
                                               written, format_factor(digit),
                                               format_factor(as.value), format_factor(as.value)),
                                   file_.nodes[l.node].range);
                        d.level = severity::note;
                    }
                    return true;
                }
                // A power of ten (10^3, 1000) is a conversion as written, never a folded
                // constant: δ = 5*w*L^4/(384*E*I*10^3) with 10^4 due read its 10 as 2 × 5,
                // the deflection's own 5 taken for a conversion, and passed.
                if (l.power_of_ten)
                    continue;
                // Only numbers written to 3 or more digits, as folded factors are (528
                // too, where whole numbers must otherwise reach 1000).
                const bool whole_two_digits =
                    l.value >= 10.0 && l.value < 100.0 && l.value == std::round(l.value);
                // Konya's 0.34*ρ*d^2 (π/4 × 0.4335, in² and g/cm³ to lb/ft; Konya and
                // Walter, Surface Blast Design, from memory): a circle's constant is printed
                // to two digits too, and read so beside a square alone, to those digits.
                const std::string_view printed = text(file_.nodes[l.node].range);
                const bool two_digit_decimal = printed.find('.') != std::string_view::npos &&
                                               significant_digits(printed) == 2 && !l.factor_like;
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
                    // Or beside a flow over a length: the Reynolds number from a flow,
                    // Re = 4Q/(π·D·ν) (V·D with V = Q/(π·D²/4)), as the pipeline trade's
                    // 92.24 in Re = 92.24*Q_bpd/(d_in*ν_cSt) folds it (common practice).
                    if (c.circle && !squares_something(ops[index[i]].node) &&
                        !(has_factor_of_dimension(ops[index[i]].node, volume_flow_dim, 1) &&
                          has_factor_of_dimension(ops[index[i]].node, length_dimension(), -1)))
                        continue;
                    if (c.half_of_a_square_or_radius && !may_hold_a_half(ops[index[i]]))
                        continue;
                    if (c.beside_pi && !holds_pi(ops[index[i]].node))
                        continue;
                    if (c.beside_logarithm && !formula_takes_a_logarithm(ops[index[i]].node))
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
    // "π*D^2*L/4e6 + π*D^3/6e9" (a tank's barrel and its two hemispherical ends, D in mm): each
    // term folds its own digit into its own power of ten, which only read together reconcile.
    if (parts.size() > 1 && parts.size() <= 4) {
        std::array<std::array<scale_literal, number_swap::most_numbers>, 4> all{};
        std::vector<scaled_operand> together(parts.begin(), parts.end());
        int folded = 0;
        for (std::size_t i = 0; i < parts.size(); ++i) {
            if (parts[i].literals.size() > number_swap::most_numbers)
                return false;
            std::copy(parts[i].literals.begin(), parts[i].literals.end(), all[i].begin());
            for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
                const scale_literal& l = parts[i].literals[k];
                if (!(l.value > 0) || !std::isfinite(l.value) || l.power_of_ten ||
                    file_.nodes[l.node].kind != expr_kind::number)
                    continue;
                if (const std::optional<double> power =
                        folded_power_of_ten(ops, index, i, l, false)) {
                    all[i][k] = power_of_ten_literal(l, *power);
                    ++folded;
                }
            }
            together[i].literals = {all[i].data(), parts[i].literals.size()};
        }
        if (folded >= 2) {
            const reconciliation r = reconcile(together);
            if (r.agree) {
                unit = r.unit;
                return true;
            }
        }
    }
    return false;
}

// The power of ten a number folds beside its coefficient, where it may: one digit times a
// power of ten (4e6, 0.004); a whole coefficient to 99 (16e6 in τ = 16e6*T/(π*d^3) from
// kN·m and mm to MPa); any coefficient written with that exponent (5.093e6); and ten
// beside π (20*PI() in T = V_g*Δp/(20π) from cm³ and bar to N·m, 1 cm³·bar = 0.1 J).
// The number read as an exact conversion `value` in place of what was written.
scale_literal checker::exact_conversion_literal(const scale_literal& l, const rational& value) {
    scale_literal as = l;
    as.value = value.to_double();
    as.tolerance = 0.0;
    as.low = value;
    as.high = value;
    as.power_of_ten = false;
    as.power = 0;
    as.factor_like = true;
    as.table_digits = false;
    return as;
}

scale_literal checker::power_of_ten_literal(const scale_literal& l, double power) {
    std::int64_t ten = 1;
    for (int p = 0; p < std::abs(static_cast<int>(power)); ++p)
        ten *= 10;
    scale_literal as = exact_conversion_literal(l, power > 0 ? rational(ten) : rational(1, ten));
    as.value = std::pow(10.0, power);
    as.power_of_ten = true;
    as.power = static_cast<std::int8_t>(power);
    return as;
}

// 24 as 2 × 12 (in per ft) and 120 as 2 × 60 (s per min): the conversion alone, exact. And
// 30 as 60 ÷ 2, "ω = π*n/30" with n in rpm: 2π/60 with its 2 taken into the 60 (ISO 80000-3's
// ω = 2πn; the trades write π/30 as often).
std::optional<scale_literal> checker::twice_a_conversion(const scale_literal& l) {
    for (const std::int64_t conversion : {12, 60})
        if (l.value == 2.0 * static_cast<double>(conversion))
            return exact_conversion_literal(l, rational(conversion));
    // 30000 in "P = T*π*n/30000", kW from N·m and rpm: 60000 ÷ 2 likewise.
    if (l.value == 30.0 || l.value == 30000.0)
        return exact_conversion_literal(l, rational(2 * static_cast<std::int64_t>(l.value)));
    return std::nullopt;
}

// "ω = 2*π*n/30" with n in rpm: π/30 is 2π/60 already, so the 2 is taken twice. Turning the
// 2 over reconciles the units too, but advice to divide by it, "4 times its true value",
// would leave a reader puzzled where the line is simply twice too large.
bool checker::report_two_of_two_pi_twice(const operand& op, const scale_literal& l) {
    if (l.value != 2.0 || l.exponent != 1.0 || !holds_pi(op.node) ||
        !(holds_number(op.node, 30.0) || holds_number(op.node, 30000.0)))
        return false;
    diagnostic& d = report(rules::unit_scale,
                           fmt::format("{} takes the 2 of 2\u03C0 twice: \u03C0/30 is 2\u03C0/60 "
                                       "already, so as written the result is 2 times its true "
                                       "value",
                                       quote(op.node)),
                           file_.nodes[l.node].range);
    add_term_and_units(d, op);
    d.notes.push_back({"write 2*pi*n/60, or pi*n/30 (ω = 2πn, ISO 80000-3)", {}});
    return true;
}

// `second`: the reading one power lower, where the number has one (1.6e7 as 16 × 10⁶).
std::optional<double> checker::folded_power_of_ten(std::span<const operand> ops,
                                                   std::span<const std::size_t> index,
                                                   std::size_t i, const scale_literal& l,
                                                   bool second) const {
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

// {g_n} among a product's factors.
bool checker::holds_standard_gravity(std::uint32_t k) const {
    return for_each_factor(k, [&](std::uint32_t at, int) {
        const syntax::expr_node& n = file_.nodes[at];
        return n.kind == expr_kind::quantity && file_.quantities[n.lhs].constant &&
               std::abs(file_.quantities[n.lhs].si_factor - 9.80665) < 1e-12;
    });
}

// An expression on its own (a query, a side listed alone) belongs to no formula: then the
// term itself is searched.
bool checker::formula_takes_a_logarithm(std::uint32_t term) const {
    const auto logarithm = [&](std::uint32_t, const syntax::expr_node& n) {
        if (n.kind != expr_kind::call)
            return search_step::descend;
        const std::string name = upper_ascii(text(call_name_range(n)));
        return name == "LN" || name == "LOG" || name == "LOG10" ? search_step::found
                                                                : search_step::descend;
    };
    return current_ != nullptr ? syntax::search_formula(file_, *current_, logarithm)
                               : syntax::search_subtree(file_, term, logarithm);
}

bool checker::holds_number(std::uint32_t k, double value) const {
    return for_each_factor(k, [&](std::uint32_t at, int) {
        return file_.nodes[at].kind == expr_kind::number &&
               written_number(file_.nodes[at].range) == value;
    });
}

bool checker::holds_pi(std::uint32_t k) const {
    return for_each_factor(
        k, [&](std::uint32_t at, int) { return file_.nodes[at].kind == expr_kind::pi; });
}

// "V_L = 1000*(D/1000)*(h/1000)^2" with D and h in mm: every conversion-like number, each
// taken as a conversion, brings the units to agree (mm to m twice, m³ to L), so none is
// extra; leaving one out would agree only by reading another one as a coefficient.
bool checker::conversions_all_needed(std::span<const operand> ops,
                                     std::span<const std::size_t> index,
                                     std::span<const scaled_operand> parts,
                                     bool dimensionless) const {
    double common = 0.0;
    double slack = 1e-9;
    bool converts = false;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        double by = 1.0;
        for (const scale_literal& l : parts[i].literals)
            if (looks_like_conversion(l, !dimensionless) ||
                converts_in_term(l, ops[index[i]].type, !dimensionless) ||
                spare_time_ratio(l, ops[index[i]].type, ops[index[i]].node) ||
                spare_degree_ratio(l, ops[index[i]].node)) {
                by *= std::pow(l.value, l.exponent);
                slack += std::abs(l.exponent) * l.tolerance;
                converts = true;
            }
        const double unit = parts[i].scale / by;
        if (i == 0)
            common = unit;
        else if (!(std::abs(unit / common - 1.0) <= slack))
            return false;
    }
    return converts;
}

// "E = C*M*Q/22.4/1e6*3600" with E in kg/h: the 1e6 converts, and the 3600 beside it is a
// conversion the units do not need. A conversion-like number that the others reconcile
// without is reported as not needed.
bool checker::report_extra_factor(std::span<const operand> ops, std::span<const std::size_t> index,
                                  std::span<const scaled_operand> parts, bool dimensionless) {
    if (conversions_all_needed(ops, index, parts, dimensionless))
        return false;
    number_swap swap;
    // "P/(η_pct/100)*8760*u_pct/100/1000" into kWh/yr: the two 100s cancel, and either
    // one's removal reconciles as well as the 1000's; the numbers that cancel are tried
    // last, so that the 1000 is named.
    const auto cancelled = [](std::span<const scale_literal> literals, std::size_t k) {
        return std::any_of(literals.begin(), literals.end(), [&](const scale_literal& o) {
            return &o != &literals[k] && o.value == literals[k].value &&
                   o.exponent == -literals[k].exponent;
        });
    };
    for (const bool cancelling : {false, true})
        for (std::size_t i = 0; i < parts.size(); ++i) {
            if (parts[i].literals.size() > number_swap::most_numbers)
                continue;
            for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
                const scale_literal& l = parts[i].literals[k];
                if (cancelled(parts[i].literals, k) != cancelling)
                    continue;
                // "Q_m3h = Q_cfm*1.699*60": 1.699 is m³/h per cfm already, and the minutes
                // in an hour beside it are counted twice.
                if (!(looks_like_conversion(l, !dimensionless) ||
                      converts_in_term(l, ops[index[i]].type, !dimensionless) ||
                      spare_time_ratio(l, ops[index[i]].type, ops[index[i]].node) ||
                      spare_degree_ratio(l, ops[index[i]].node)) ||
                    (l.exponent == 1.0 && (l.value == 1e3 || l.value == 1e6 || l.value == 1e9) &&
                     l.value == counted_multiple(ops[index[i]].node)))
                    continue;
                if (swap.unit_with(parts, i, k, number_swap::left_out(l)))
                    return report_unneeded(ops[index[i]], l);
            }
        }
    return false;
}

// "P = E*I/L^2/1000" with P already in kN: the units agree without the factor.
bool checker::report_unneeded_factor(std::span<const operand> ops,
                                     std::span<const std::size_t> index,
                                     std::span<const scaled_operand> parts, bool dimensionless) {
    for (std::size_t i = 0; i < parts.size(); ++i) {
        // "E_pct = f_pct*100": a percentage made a percentage again, where the term holds
        // one and the units agree in percent without the 100.
        const bool in_percent =
            dimensionless && std::abs(parts[i].scale - 0.01) < 1e-12 &&
            for_each_factor(ops[index[i]].node, [&](std::uint32_t at, int) {
                return dimensionless_unit_size(at) == std::optional<double>(0.01);
            });
        // V*1000*L^3/(3*E*1000*I): conversions that cancel each other are none. So are
        // "(d_mm/1000)*ρ*V^2/2000" into kPa, the 2 of ρV²/2 folded into the second 1000.
        double net = 1.0;
        const scale_literal* first = nullptr;
        std::optional<double> first_folded;
        for (const auto& l : parts[i].literals)
            if (converts_in_term(l, ops[index[i]].type, !dimensionless || in_percent) ||
                spare_time_ratio(l, ops[index[i]].type, ops[index[i]].node) ||
                spare_speed_ratio(l, ops[index[i]].node) ||
                spare_degree_ratio(l, ops[index[i]].node)) {
                const std::optional<double> folded =
                    l.power_of_ten || file_.nodes[l.node].kind != expr_kind::number
                        ? std::nullopt
                        : folded_power_of_ten(ops, index, i, l, false);
                net *=
                    folded ? std::pow(10.0, *folded * l.exponent) : std::pow(l.value, l.exponent);
                if (first == nullptr) {
                    first = &l;
                    first_folded = folded;
                }
            }
        if (first != nullptr && std::abs(net - 1.0) > 1e-9 &&
            std::abs(net / counted_multiple(ops[index[i]].node) - 1.0) > 1e-9)
            return report_unneeded(ops[index[i]], *first, first_folded);
    }
    return false;
}

// "L_10 : 1 "basic rating life, millions of revolutions"" (ISO 281): a symbol whose
// description says it counts in thousands, millions or billions, multiplied in the term,
// so that 1e6*L_10 is its count; 1 where none does.
double checker::counted_multiple(std::uint32_t k) const {
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

// "p_g*10/100": a percentage written as its number over 100 (10 % of the supply
// pressure), no unit conversion, where the number just before the /100 is a whole one up
// to 100.
// "Q*0.005/100", a drift of 0.005 % of the circulation, too: a decimal number up to 100
// that does not look like a conversion itself.
bool checker::percentage_written_out(const scale_literal& l) const {
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
bool checker::hundred_over_percent_sum(std::uint32_t term, const scale_literal& l) const {
    if (l.value != 100.0 || l.exponent != 1.0)
        return false;
    return for_each_factor(term, [&](std::uint32_t at, int sign) {
        const std::uint32_t leading = sign < 0 ? number_leading_sum(at, false) : syntax::no_index;
        return leading != syntax::no_index && written_number(file_.nodes[leading].range) == 100.0;
    });
}

// The node a number stands for as a factor: "10^6" where it is raised, else the number.
std::uint32_t checker::raised_number(std::uint32_t root, std::uint32_t number) const {
    std::uint32_t found = number;
    syntax::search_subtree(file_, root, [&](std::uint32_t at, const syntax::expr_node& n) {
        if (n.kind == expr_kind::power && syntax::inside_brackets(file_, n.lhs) == number) {
            found = at;
            return search_step::found;
        }
        return search_step::descend;
    });
    return found;
}

bool checker::report_unneeded(const operand& op, const scale_literal& l,
                              std::optional<double> folded_power) {
    if (percentage_written_out(l) || hundred_over_percent_sum(op.node, l))
        return false;
    // "(1 - 0.70)", the share a reclaim leaves, whose 0.30 only looks like 0.3048 m per ft:
    // a sum of numbers is a fraction of the formula's own, never a conversion typed in.
    if (const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, l.node)];
        n.kind == expr_kind::add || n.kind == expr_kind::subtract)
        return false;
    const double factor = std::pow(l.value, l.exponent);
    // "/10^6": the factor is the power, not its base.
    const std::uint32_t shown =
        std::abs(l.exponent) != 1.0 ? raised_number(op.node, l.node) : l.node;
    // "ρ*V^2/2000" where the units agree already: the 1000 folded beside the formula's own
    // 2 is the slip; removing the whole number would take the 2 with it.
    if (folded_power && std::abs(l.exponent) == 1.0) {
        const double power = std::pow(10.0, *folded_power);
        const double digit = l.value / power;
        const std::string written(text(file_.nodes[shown].range));
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("the {} folded into {} ({} × {}) is not needed: the units of {} "
                        "already agree, so as written it is {} times its true value",
                        format_factor(power), written, format_factor(digit), format_factor(power),
                        quote(op.node), format_factor(std::pow(power, l.exponent))),
            file_.nodes[shown].range);
        add_term_and_units(d, op);
        d.notes.push_back({fmt::format("write {} in place of {}, keeping the formula's own {}",
                                       format_factor(digit), written, format_factor(digit)),
                           {}});
        return true;
    }
    diagnostic& d =
        report(rules::unit_scale,
               fmt::format("the factor {} is not needed: the units of {} already agree, so "
                           "as written it is {} times its true value",
                           text(file_.nodes[shown].range), quote(op.node),
                           format_factor(printed_power(l, l.exponent), factor)),
               file_.nodes[shown].range);
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
void checker::report_inverted_factor(const operand& op, const scale_literal& l) {
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
    d.notes.push_back({fmt::format("as written the result is {} times its true value", times), {}});
}

// "q_psf = 47.88*s_k" with s_k in kPa: 47.88 Pa a psf (NIST SP 811 (2008), B.8) applied the
// wrong way round, and the kPa's 1000 left out besides. Turned over, the factor leaves the two
// sides a clean power of ten apart; saying both parts is advice that, followed, mends the line,
// where a bare "divide by 2.29" would not show what went wrong.
bool checker::report_inverted_and_decade_short(std::span<const operand> ops,
                                               std::span<const std::size_t> index,
                                               std::span<const scaled_operand> parts) {
    for (std::size_t i = 0; i < 2; ++i)
        for (std::size_t k = 0; k < parts[i].literals.size() && k < 10; ++k) {
            const scale_literal& l = parts[i].literals[k];
            if (std::abs(l.exponent) != 1.0 || l.power_of_ten || !(l.value > 1.0) ||
                !std::isfinite(l.value) || file_.nodes[l.node].kind != expr_kind::number ||
                !looks_like_conversion(l, false) || is_time_ratio(l))
                continue;
            // How many times as much term i counts as the other, and once the factor is
            // turned over.
            const double counts = apparent_scale(parts[1 - i]) / apparent_scale(parts[i]);
            const double turned = counts * std::pow(l.value, -2.0 * l.exponent);
            const double slack = 2.0 * std::max(l.tolerance, 1e-6);
            if (!near_power_of_ten(turned, slack))
                continue;
            const double decade = std::pow(10.0, std::round(std::log10(turned)));
            if (decade < 1e-9 || decade > 1e9 || (decade > 0.02 && decade < 50.0))
                continue;
            const operand& op = ops[index[i]];
            const std::string_view written = text(file_.nodes[l.node].range);
            const bool divides = l.exponent < 0;
            const std::string missing = format_factor(decade > 1.0 ? decade : 1.0 / decade);
            diagnostic& d = report(
                rules::unit_scale,
                fmt::format("the factor {} is the wrong way round, and a further {} is missing: "
                            "the units of {} need {} by {} and {} by {}",
                            written, missing, quote(op.node),
                            divides ? "a multiplication" : "a division", written,
                            decade > 1.0 ? "a division" : "a multiplication", missing),
                file_.nodes[l.node].range);
            add_term_and_units(d, op);
            d.notes.push_back({fmt::format("as written the result is {} times its true value",
                                           format_factor(counts)),
                               {}});
            return true;
        }
    return false;
}

} // namespace plumb::formula_check
