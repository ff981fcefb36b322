// What functions take: unit-free arguments, angles in radians, units that cancel.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// A dimensionless argument or exponent written in mixed units (ln(p/p_ref) with p in kPa
// and p_ref in Pa; 10^(ΔT/z) with ΔT in K and z in Δ°F) is off by the factor between them.
// The finding, or null where the units cancel or a factor the wrong way round was reported.
diagnostic* checker::report_units_not_cancelling(const operand& a, std::string_view what) {
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
    // The fix, as a factor to write into the argument: its number times the size of the unit
    // it is in ("divide ... by 1000" where kJ stands below for J).
    // Not for degrees, whose note (write sin(θ*π/180)) comes with the trigonometric rule.
    const double unit = apparent_scale(parts[0]);
    const double degree = std::numbers::pi / 180.0;
    if (std::isfinite(unit) && unit > 0.0 && std::abs(unit / degree - 1.0) > 1e-9 &&
        std::abs(unit * degree - 1.0) > 1e-9)
        d.notes.push_back({fmt::format("{} {} by {} (declare the symbols in coherent units, or "
                                       "write the conversion factor into it)",
                                       unit > 1.0 ? "multiply" : "divide", quote(a.node),
                                       format_factor(unit > 1.0 ? unit : 1.0 / unit)),
                           {}});
    return &d;
}

// Whether a product holds a symbol or a cell in a dimensionless unit with a size of its
// own (%, °, ppm), the unit a number beside it may be written in.
bool checker::holds_scaled_ratio_unit(std::uint32_t k) const {
    return for_each_factor(k, [&](std::uint32_t at, int) {
        if (const std::optional<double> size = dimensionless_unit_size(at))
            return *size != 1.0;
        // A group or a call that is itself in such a unit ((θ_1 + θ_2)/2) counts too.
        const expr_kind kind = file_.nodes[at].kind;
        return kind == expr_kind::call || kind == expr_kind::add || kind == expr_kind::subtract ||
               kind == expr_kind::power || kind == expr_kind::negate;
    });
}

// Whether a product holds a symbol or a cell in percent, a dimensionless unit of 1/100.
// A percentage among a product's factors, not converted by a 100 beside it (P/(η/100)
// holds its η as a fraction).
bool checker::holds_percentage(std::uint32_t k) const {
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
std::optional<double> checker::dimensionless_unit_size(std::uint32_t at) const {
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
bool checker::conversion_folded_with_coefficient(const operand& a, const scaled_operand& part) {
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
bool checker::takes_an_angle(std::string_view name) {
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
bool checker::angle_written_in_degrees(const operand& a) const {
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
void checker::report_degrees_taken_as_radians(const builtin_function& f, const operand& a) {
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
        for (const double c : {std::numbers::pi, 2.0 * std::numbers::pi, std::numbers::pi / 180.0,
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
                           number == "90" ? "\u03C0/2" : (number == "180" ? "\u03C0" : "2\u03C0"),
                           number, number),
         {}});
}

// "=243.04*LN(C53/6.1094)/(17.625-LN(C53/6.1094))", the Magnus fit solved for the dew
// point (Alduchov and Eskridge 1996, from memory): a workbook's numbers carry no units, so a
// cell over a number inside a logarithm is the cell over a reference value in its own unit,
// as the fit's 6.1094 hPa is. Read so, with a note, as the fit's forward form is.
bool checker::reference_value_typed_in_cell_unit(const builtin_function& f, const operand& a) {
    if (file_.functions != syntax::function_names::spreadsheet || !a.type.known ||
        a.type.dim.is_dimensionless() || (f.name != "LN" && f.name != "LOG" && f.name != "LOG10"))
        return false;
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, a.node)];
    if (n.kind != expr_kind::divide)
        return false;
    const syntax::expr_node& cell = file_.nodes[syntax::inside_brackets(file_, n.lhs)];
    const syntax::expr_node& number = file_.nodes[syntax::inside_brackets(file_, n.rhs)];
    if (cell.kind != expr_kind::reference || number.kind != expr_kind::number ||
        !(written_number(number.range) > 0))
        return false;
    const syntax::reference_value& r = file_.references[cell.lhs];
    if (!r.dim || r.offset != nullptr || r.unit_text.empty())
        return false;
    diagnostic& d = report(
        rules::trade_constant,
        fmt::format("{} is read as a reference value in {}'s unit, {}: the argument of "
                    "{} is then a ratio",
                    display_text(number.range), display_text(cell.range), r.unit_text, f.name),
        number.range);
    d.level = severity::note;
    d.notes.push_back({std::string(fit_units_note), {}});
    return true;
}

// "tan(α*180/pi)" with α in degrees, "tan(θ*180/pi)" with θ in rad, "sin(α*pi/180*pi/180)":
// the degree's conversion π/180 written the wrong way round, where none is due, or twice. The
// argument's own angle unit says how many are due: one for degrees, none for radians (SI
// Brochure 9th ed., table 8: 1° = π/180 rad). True where a finding was made.
bool checker::report_angle_conversion_in_argument(const builtin_function& f, const operand& a) {
    if (!a.type.known || !a.type.dim.is_dimensionless() || a.type.literal_count < 2 ||
        !std::isfinite(a.type.scale))
        return false;
    const bool degrees = std::abs(a.type.scale * 180.0 / std::numbers::pi - 1.0) < 1e-9;
    const bool radians = std::abs(a.type.scale - 1.0) < 1e-12 && !a.type.numeric;
    if (!degrees && !radians)
        return false;
    // π/180 pairs among the argument's numbers: +1 for each that multiplies by π/180, -1 for
    // each 180/π.
    std::array<bool, 16> used{};
    const std::span<const scale_literal> numbers(literals_.data() + a.type.literal_begin,
                                                 std::min<std::size_t>(a.type.literal_count, 16));
    int pairs = 0;
    for (std::size_t p = 0; p < numbers.size(); ++p) {
        if (file_.nodes[numbers[p].node].kind != expr_kind::pi ||
            std::abs(numbers[p].exponent) != 1.0)
            continue;
        for (std::size_t k = 0; k < numbers.size(); ++k)
            if (!used[k] && numbers[k].value == 180.0 &&
                numbers[k].exponent == -numbers[p].exponent &&
                text(file_.nodes[numbers[k].node].range) == "180") {
                used[k] = true;
                pairs += numbers[p].exponent > 0 ? 1 : -1;
                break;
            }
    }
    const int due = degrees ? 1 : 0;
    if (pairs == due || (pairs == 0 && degrees))
        return false;
    const double per_pair = 180.0 / std::numbers::pi;
    const double off = std::pow(per_pair, due - pairs);
    const std::string angle = display_text(file_.nodes[a.node].range);
    const std::string what =
        pairs > due ? (degrees ? "the angle's conversion to radians, π/180, is written twice"
                               : "the angle is in radians already, and π/180 converts it again")
        : degrees   ? "the conversion 180/π is the wrong way round: an angle in degrees times "
                      "π/180 is in radians"
                    : "the angle is in radians already, and 180/π turns it into degrees, which "
                      "the function does not take";
    diagnostic& d =
        report(rules::unit_scale,
               fmt::format("{}: as written, the argument of {} is {} times its true value", what,
                           f.name, format_factor(rounded_to_digits(off, 6))),
               file_.nodes[a.node].range);
    d.level = severity::warning;
    add_term(d, a, true);
    d.notes.push_back({fmt::format("{} takes radians: an angle in degrees times π/180, one in "
                                   "radians as it is",
                                   f.name),
                       {}});
    return true;
}

void checker::require_unit_free(const builtin_function& f, const operand& a) {
    const bool angle = takes_an_angle(f.name);
    if (angle && report_angle_conversion_in_argument(f, a)) [[unlikely]]
        return;
    if (angle && angle_written_in_degrees(a))
        return;
    diagnostic* found = report_units_not_cancelling(a, fmt::format("the argument of {}", f.name));
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
        // tan(pi/4 - φ/2): a term with π in it is in radians already; the angle alone is
        // converted, or π/4 would be divided by 57.3 too.
        if (sum) {
            const syntax::expr_node& n = file_.nodes[a.node];
            const bool left_pi = holds_pi(n.lhs);
            const bool right_pi = holds_pi(n.rhs);
            if (left_pi != right_pi) {
                const std::string left = display_text(file_.nodes[n.lhs].range);
                const std::string right = display_text(file_.nodes[n.rhs].range);
                const char* op = kind == expr_kind::add ? " + " : " - ";
                const std::string converted =
                    left_pi ? fmt::format("{}{}{}*\u03C0/180", left, op,
                                          file_.nodes[n.rhs].kind == expr_kind::add ||
                                                  file_.nodes[n.rhs].kind == expr_kind::subtract
                                              ? "(" + right + ")"
                                              : right)
                            : fmt::format("({})*\u03C0/180{}{}", left, op, right);
                d.notes.push_back(
                    {fmt::format("{} takes radians, and {} is in radians already: "
                                 "convert the angle alone, {}({}), or declare it "
                                 "in rad",
                                 f.name, quote(left_pi ? n.lhs : n.rhs), f.name, converted),
                     {}});
                return;
            }
        }
        d.notes.push_back({fmt::format("{} takes radians: write {}({}{}{}*\u03C0/180), or "
                                       "declare the angle in rad",
                                       f.name, f.name, sum ? "(" : "", angle, sum ? ")" : ""),
                           {}});
    }
}

// True when the argument is dimensionless (or unknown), false when a finding was made.
bool checker::require_dimensionless(const builtin_function& f, const operand& a) {
    if (!a.type.known || a.type.dim.is_dimensionless())
        return true;
    const bool trig = f.name.find("sin") != std::string_view::npos ||
                      f.name.find("cos") != std::string_view::npos ||
                      f.name.find("tan") != std::string_view::npos;
    diagnostic& d = report(rules::dimensioned_argument,
                           fmt::format("{} needs a dimensionless argument, but {} is {}", f.name,
                                       quote(a.node), describe(a.type.dim)),
                           file_.nodes[a.node].range);
    add_term(d, a);
    d.notes.push_back({trig ? std::string("an angle is dimensionless: give it in radians, or "
                                          "as a ratio of two lengths")
                            : std::string("divide by a reference value of the same dimension, "
                                          "as in ln(p/p_ref)"),
                       {}});
    return false;
}

} // namespace plumb::formula_check
