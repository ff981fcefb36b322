// Rules read from a formula's two sides as wholes: power against apparent power and energy,
// cycles against radians, a fit constant carrying a cell's unit, Hazen-Williams' constant;
// and the notes on how a side's units were read (a product after a slash, a ton beside a
// power).
#include "check/formula/checker.hpp"
#include "model/ascii_case.hpp"

namespace plumb::formula_check {

// "c_c : $/TR·h", "k : W/m·K": a product after a slash, which reads left to right as
// ($/TR)·h (NIST SP 811 (2008), 6.1.6, asks for parentheses); a mismatch in a formula that
// uses such a symbol says how it was read.
void checker::note_unit_read_past_a_slash(diagnostic& d) const {
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
        named = fmt::format("'{}' is declared in {}, which reads left to right as ({})\u00B7{}: "
                            "if all of it after the slash is below the line, write {}({})",
                            text(n.range), unit, unit.substr(0, product),
                            unit.substr(product + mark_size), unit.substr(0, slash + 1),
                            unit.substr(slash + 1));
    });
    if (!named.empty())
        d.notes.push_back({std::move(named), {}});
}

// "E_c : ton*h" beside kWh: the short ton where a ton of refrigeration was meant.
void checker::note_ton_beside_power(diagnostic& d, std::span<const operand> sides) {
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
bool checker::fit_constant_carries_cell_unit(std::span<const operand> sides) {
    const operand& formula = sides[1];
    if (celsius_reading(sides[0]) && formula.type.known && formula.type.offset == nullptr &&
        formula.type.dim.is_dimensionless()) [[unlikely]] {
        const std::uint32_t b = magnus_solved_constant(formula.node);
        if (b == syntax::no_index)
            return false;
        diagnostic& d = report(rules::trade_constant,
                               fmt::format("{} is read as the Magnus fit's constant in \u00B0C: "
                                           "the fit solved for the temperature gives a reading "
                                           "on the \u00B0C scale",
                                           display_text(file_.nodes[b].range)),
                               file_.nodes[b].range);
        d.level = severity::note;
        d.notes.push_back({std::string(fit_units_note), {}});
        return true;
    }
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
    d.notes.push_back({std::string(fit_units_note), {}});
    return true;
}

// "=4.52*Q^1.85/(C^1.85*D^4.87)" in psi/ft with Q in gpm and D in inches (Hazen-Williams as
// the fire-protection and water trades print it, from memory): the constant is 10.67 in SI
// units for a head, and 10.67 times water's specific weight (9.76 to 9.81 kN/m³) for a
// pressure. Restated for the cell's units it must land on one of them; a bore in mm where
// the form takes inches lands far off, and the cell is then wrong, not a fit.
bool checker::report_hazen_williams_constant(std::span<const operand> sides,
                                             std::uint32_t constant) {
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
    diagnostic& d =
        report(rules::unit_scale,
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

// "H = E/S_r": a machine's inertia constant is its stored energy over its rated apparent
// power, in seconds (Kundur, Power System Stability and Control, 1994, ch. 3; from memory),
// with no power factor in it.
bool checker::names_inertia_constant(std::span<const operand> sides) const {
    return std::any_of(sides.begin(), sides.end(), [&](const operand& side) {
        const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, side.node)];
        if (n.kind != expr_kind::symbol || !side.type.known || !(side.type.dim == time_dim))
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        return e != nullptr && lower_ascii(e->description).find("inertia") != std::string::npos;
    });
}

// "SAD_m = Q_air/A_m" with SAD_m in Nm³/(m²·h): a side that is one symbol stated at reference
// conditions, a specific aeration demand or a standard superficial rate, and no gas's speed.
bool checker::lone_symbol_at_reference(std::span<const operand> sides) const {
    return std::any_of(sides.begin(), sides.end(), [&](const operand& side) {
        const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, side.node)];
        if (n.kind != expr_kind::symbol)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        return e != nullptr && (unit_marks_of(e->unit_text) & at_reference_conditions) != 0;
    });
}

// Rules for units that the file declares (symbol_table::unit_marks), asked of an equation
// whose sides agree. Where a note read a number in it (`noted`: 9549 holds the 2π, 6356 is
// the fan trade's), only the gas-state rules ask, which no number the notes read answers.
void checker::ask_of_marked_units(const syntax::formula& f, std::span<const operand> sides,
                                  bool noted) {
    if (sides.size() != 2 || !sides[0].type.known)
        return;
    const std::uint8_t marks = symbols_.unit_marks();
    const std::size_t findings_before_rotation = out_.size();
    if (!noted && (marks & counts_revolutions) != 0 && asks_for_two_pi(sides[0].type.dim))
        report_revolution_without_two_pi(f, sides[0].type.dim);
    // A speed in rpm declared anywhere in the file must not hide a gas velocity taken from a
    // flow at reference conditions: where the rotation rules found nothing, these still ask.
    if (out_.size() == findings_before_rotation && (marks & at_reference_conditions) != 0) {
        if (is_gas_volume_or_flow(sides[0].type.dim)) {
            const std::size_t findings_before = out_.size();
            report_actual_volume_as_normal(sides);
            if (out_.size() == findings_before)
                report_reference_temperatures_left_out(sides);
        } else {
            // "w_N = 16.02*W" with w_N in mg/Nm3 and W in lb/MMscf: a concentration per
            // reference volume takes the reference temperatures' ratio as a volume does
            // (16.93 into mg/Nm³, 16.02 into mg/Sm³; GPSA Engineering Data Book, from memory).
            const std::size_t findings_before = out_.size();
            report_reference_temperatures_left_out(sides);
            for (const operand& side : sides) {
                if (out_.size() != findings_before)
                    break;
                if (report_normal_measure_times_actual_volume(side) ||
                    (sides[0].type.dim == power_dim && report_power_from_normal_flow(side)) ||
                    (sides[0].type.dim == velocity_dim && !lone_symbol_at_reference(sides) &&
                     report_velocity_from_normal_flow(side)) ||
                    (sides[0].type.dim == area_dimension() && report_area_from_normal_flow(side)) ||
                    report_reference_states_in_ratio(side))
                    break;
            }
        }
    }
    if (noted)
        return;
    if ((marks & apparent_power) != 0 && sides[0].type.dim == power_dim)
        report_apparent_as_real_power(sides);
    else if ((marks & apparent_power) != 0 && !names_inertia_constant(sides))
        for (std::size_t i = 0; i < 2; ++i)
            if (report_apparent_power_without_factor(sides[i], sides[1 - i]))
                break;
}

// "f_1 = sqrt(k/M)" with f_1 in Hz: √(k/m) and √(g/δ) are angular frequencies, in rad/s,
// and a frequency in cycles is that over 2π (f = √(k/m)/(2π), Chopra, Dynamics of
// Structures, ch. 2, from memory). The units cannot say so, as a radian is 1. Asked where
// one side is a symbol in Hz and the other a square root with no number beside it.
void checker::report_angular_frequency_as_cycles(std::span<const operand> sides) {
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
        diagnostic& d =
            report(rules::unit_scale,
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
// (and over the inverter's efficiency; IEEE 1184, from memory). "m_f = SFC*S_r/1000" with
// SFC in g/kWh and "E = S_r*t" into kWh: a fuel rate, a tariff or an emission factor per
// kWh counts kWh of real energy, and so does an energy in Wh or J, while a generating set or
// a transformer is rated in kVA (ISO 8528-1 rates a set at 0.8 power factor, from memory).
// Asked of a product that divides an energy by an apparent power, or multiplies one by a
// quantity per unit of energy, or into an energy, with no power factor beside it.
bool checker::report_apparent_power_without_factor(const operand& side, const operand& other) {
    std::uint32_t energy = syntax::no_index;
    std::uint32_t per_energy = syntax::no_index;
    std::uint32_t apparent = syntax::no_index;
    int apparent_sign = 0;
    bool factor_beside = false;
    const auto is_per_energy = [](const compact_dimension& d) {
        if (d.is_dimensionless() || d.in_arena())
            return false;
        const compact_dimension counted = d * energy_dim;
        return counted.is_dimensionless() || counted == mass_dim || counted == volume_dim;
    };
    for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        // "S*0.8": a power factor typed as a number, as a rating's 0.8 is.
        if (n.kind == expr_kind::number && sign > 0) {
            const double v = written_number(n.range);
            factor_beside = factor_beside || (v >= 0.5 && v < 1.0);
            return false;
        }
        if (n.kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(n.range);
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr || !e->compact_dim)
            return false;
        const bool in_apparent_units = (unit_marks_of(e->unit_text) & apparent_power) != 0;
        if (in_apparent_units && *e->compact_dim == power_dim) {
            apparent = at;
            apparent_sign = sign;
        } else if (in_apparent_units) {
            // c in $/kVAh or a demand charge per kVA: counted against the apparent power.
            factor_beside = true;
        } else if (*e->compact_dim == energy_dim && sign > 0 &&
                   (e->unit_text.find("Wh") != std::string_view::npos ||
                    e->unit_text.find('J') != std::string_view::npos)) {
            energy = at;
        } else if (sign > 0 && is_per_energy(*e->compact_dim)) {
            per_energy = at;
        } else if (e->compact_dim->is_dimensionless() && names_power_factor(name)) {
            factor_beside = true;
        }
        return false;
    });
    if (apparent == syntax::no_index || factor_beside)
        return false;
    const symbol_entry& s = *symbols_.find(text(file_.nodes[apparent].range));
    const auto unit_of = [&](std::uint32_t at) {
        return symbols_.find(text(file_.nodes[at].range))->unit_text;
    };
    std::string message;
    std::string advice;
    if (apparent_sign < 0 && energy != syntax::no_index) {
        message = fmt::format("{} is an apparent power ({}): {} lasts as long as the real power "
                              "drawn from it, which is the apparent power times the power "
                              "factor, and this formula leaves the power factor out",
                              quote(apparent), s.unit_text, quote(energy));
        advice = "divide by the real power, S*pf (and over the inverter's or the drive's "
                 "efficiency where there is one)";
    } else if (apparent_sign > 0 && per_energy != syntax::no_index) {
        message = fmt::format("{} is an apparent power ({}), and {} counts per unit of real "
                              "energy, in {}: the real power is the apparent power times the "
                              "power factor, which this formula leaves out",
                              quote(apparent), s.unit_text, quote(per_energy), unit_of(per_energy));
        advice = "multiply the apparent power by the power factor, S*pf, or use the real "
                 "power in kW";
    } else if (apparent_sign > 0 && side.type.known && side.type.dim == energy_dim &&
               declares_real_energy(other.node)) {
        message = fmt::format("{} is an apparent power ({}), and this side is an energy, "
                              "counted in real power over time: the real power is the apparent "
                              "power times the power factor, which this formula leaves out",
                              quote(apparent), s.unit_text);
        advice = "multiply the apparent power by the power factor, S*pf, or use the real "
                 "power in kW";
    } else {
        return false;
    }
    diagnostic& d = report(rules::unit_scale, std::move(message), file_.nodes[side.node].range);
    d.level = severity::warning;
    d.notes.push_back({std::move(advice), {}});
    return true;
}

// A side that is a symbol declared in Wh or J (not kVAh), times conversions.
bool checker::declares_real_energy(std::uint32_t node) const {
    const std::uint32_t at = sole_symbol_times_conversions(node);
    if (at == syntax::no_index)
        return false;
    const std::optional<std::string_view> unit = declared_unit_text(at);
    return unit && (unit_marks_of(*unit) & apparent_power) == 0 &&
           (unit->find("Wh") != std::string_view::npos ||
            unit->find('J') != std::string_view::npos);
}

// A power factor or an efficiency by its name: pf, cosφ, η. Not by a description, which
// "pf, DoD : 1 "power factor, depth of discharge"" shares between two names.
bool checker::names_power_factor(std::string_view name) {
    for (const std::string_view part : {"pf", "PF", "cos", "\u03B7", "eta", "eff"})
        if (name.find(part) != std::string_view::npos)
            return true;
    return false;
}

// "P_e = S" with S in kVA and P_e in kW: apparent power is the real power over the power
// factor; the units alone cannot say so, as both are watts to the dimension.
// A workbook's cells count as symbols here: "=C11" under kW with C11 in kVA.
void checker::report_apparent_as_real_power(std::span<const operand> sides) {
    // Each side's one power, a symbol or a cell, with the power of a power factor beside it
    // (pf, cosφ; an efficiency or a conversion beside it changes nothing here).
    struct power_side {
        std::uint32_t power = syntax::no_index;
        int factor = 0;
    };
    const auto read_side = [&](std::uint32_t k) -> std::optional<power_side> {
        power_side side;
        const bool other = for_each_factor(k, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return !plain_conversion_number(at);
            if (n.kind == expr_kind::symbol) {
                const std::string_view name = text(n.range);
                const symbol_entry* e = symbols_.find(name);
                if (e != nullptr && e->compact_dim && e->compact_dim->is_dimensionless()) {
                    if (names_power_factor(name))
                        side.factor += names_efficiency(name) ? 0 : sign;
                    return !names_power_factor(name);
                }
            }
            if (n.kind != expr_kind::symbol && n.kind != expr_kind::reference)
                return true;
            const bool second = side.power != syntax::no_index;
            side.power = at;
            return second || sign < 0;
        });
        if (other || side.power == syntax::no_index)
            return std::nullopt;
        return side;
    };
    const std::optional<power_side> left = read_side(sides[0].node);
    const std::optional<power_side> right = read_side(sides[1].node);
    if (!left || !right)
        return;
    const std::optional<std::string_view> a = declared_unit_text(left->power);
    const std::optional<std::string_view> b = declared_unit_text(right->power);
    if (!a || !b)
        return;
    const bool a_apparent = (unit_marks_of(*a) & apparent_power) != 0;
    const bool b_apparent = (unit_marks_of(*b) & apparent_power) != 0;
    if (a_apparent == b_apparent)
        return;
    const power_side& apparent_side = a_apparent ? *left : *right;
    const power_side& real_side = a_apparent ? *right : *left;
    const std::string_view apparent = a_apparent ? *a : *b;
    const std::string_view real = a_apparent ? *b : *a;
    if (real.find('W') == std::string_view::npos)
        return;
    // S·pf = P, or S = P/pf: the power factor stands once with the apparent power.
    const int factor = apparent_side.factor - real_side.factor;
    if (factor == 1 || (factor != 0 && factor != -1))
        return;
    const std::string apparent_name(text(file_.nodes[apparent_side.power].range));
    const std::string real_name(text(file_.nodes[real_side.power].range));
    diagnostic& d = report(
        rules::unit_scale,
        factor == 0
            ? fmt::format("'{}' is an apparent power ({}) and '{}' a real power ({}): they differ "
                          "by the power factor, which this formula leaves out",
                          apparent_name, apparent, real_name, real)
            : fmt::format("the power factor is the wrong way round: '{}' is an apparent power "
                          "({}) and '{}' a real power ({}), and the apparent power is the larger",
                          apparent_name, apparent, real_name, real),
        file_.nodes[sides[1].node].range);
    d.level = severity::warning;
    d.notes.push_back({"real power is the apparent power times the power factor, P = S*pf "
                       "(and S = sqrt(3)*V*I for three phases)",
                       {}});
}

// An efficiency by its name (η, eff): beside a power factor it changes nothing about where
// the power factor goes.
bool checker::names_efficiency(std::string_view name) {
    for (const std::string_view part : {"\u03B7", "eta", "eff"})
        if (name.find(part) != std::string_view::npos)
            return true;
    return false;
}

bool checker::is_gas_volume_or_flow(const compact_dimension& dim) {
    return dim == volume_dim || dim == volume_flow_dim;
}

// kW/TR, a chiller's power in per ton of cooling out (AHRI 550/590's kW/ton), is the
// reciprocal of a COP or an EER, cooling out per power in: COP = 3.517/(kW/TR) and EER =
// 12/(kW/TR), since 1 TR = 3.517 kW = 12 000 Btu/h (NIST SP 811 (2008), B.8). Both are ratios
// of powers, so "COP = e/3.517" passes the units while it sets one proportional to the other.
// Asked of an equation whose every symbol is one or the other, with numbers: each side's
// powers of cooling over input must agree.
// A factor the scale rules found the wrong way round in such an equation ("COP = 3.517*e") is
// this mistake, and their advice (divide by 3.517) would leave it: this finding replaces theirs.
void checker::report_cooling_efficiency_inverted(std::span<const operand> sides,
                                                 std::size_t findings_before) {
    enum class sense : std::uint8_t { none, input_per_output, output_per_input };
    const auto sense_of = [&](std::string_view name, const symbol_entry& e) {
        if (!e.dim || !e.dim->is_dimensionless())
            return sense::none;
        const std::string unit = lower_ascii(e.unit_text);
        if (unit.starts_with("kw/tr") || unit.starts_with("kw/tonr"))
            return sense::input_per_output;
        const std::string upper = upper_ascii(name);
        for (const std::string_view prefix : {"COP", "EER", "SEER", "IPLV"})
            if (upper.starts_with(prefix) &&
                (upper.size() == prefix.size() || upper[prefix.size()] == '_'))
                return sense::output_per_input;
        return sense::none;
    };
    std::array<int, 2> cooling_over_input{};
    const symbol_entry* per_ton = nullptr;
    std::string_view per_ton_name;
    bool output_kind = false;
    for (std::size_t i = 0; i < 2; ++i) {
        const bool other = for_each_factor(sides[i].node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return false;
            if (n.kind != expr_kind::symbol)
                return true;
            const std::string_view name = text(n.range);
            const symbol_entry* e = symbols_.find(name);
            const sense found = e != nullptr ? sense_of(name, *e) : sense::none;
            if (found == sense::none)
                return true;
            if (found == sense::input_per_output && per_ton == nullptr) {
                per_ton = e;
                per_ton_name = name;
            }
            output_kind = output_kind || found == sense::output_per_input;
            cooling_over_input[i] += found == sense::output_per_input ? sign : -sign;
            return false;
        });
        if (other)
            return;
    }
    if (per_ton == nullptr || !output_kind || cooling_over_input[0] == cooling_over_input[1])
        return;
    out_.erase(std::remove_if(out_.begin() + static_cast<std::ptrdiff_t>(findings_before),
                              out_.end(),
                              [](const diagnostic& f) { return f.rule == rules::unit_scale; }),
               out_.end());
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("'{}' ({}) is power in per ton of cooling out, and a coefficient of "
                    "performance or an EER is cooling out per power in, its reciprocal: this "
                    "equation makes one proportional to the other",
                    per_ton_name, per_ton->unit_text),
        file_.nodes[sides[1].node].range);
    d.level = severity::warning;
    d.notes.push_back({fmt::format("COP = 3.517/{} and EER = 12/{} (1 TR = 3.517 kW = 12 000 "
                                   "Btu/h); {} = 3.517/COP",
                                   per_ton_name, per_ton_name, per_ton_name),
                       {}});
}

} // namespace plumb::formula_check
