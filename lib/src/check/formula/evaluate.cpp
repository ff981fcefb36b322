// The walk that types every node (numbers, symbols, sums, products, powers, calls,
// comparisons) and the check of a whole formula that starts it.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

typed_term checker::eval_pi(std::uint32_t index) {
    typed_term t;
    t.numeric = true;
    scale_literal l;
    l.value = 3.14159265358979323846;
    l.tolerance = 1e-12;
    l.node = index;
    literals_.push_back(l);
    return t;
}

typed_term checker::eval_negate(const syntax::expr_node& n) {
    typed_term t = eval(n.lhs);
    if (t.value)
        t.value = -*t.value;
    return t;
}

typed_term checker::eval_power(const syntax::expr_node& n) {
    // "(p/p_r)^0.5", the root of a ratio of gauge readings, as sqrt(p/p_r) is read.
    if (const syntax::expr_node& e = file_.nodes[n.rhs];
        (symbols_.unit_marks() & offset_scale_readings) != 0 && e.kind == expr_kind::number &&
        file_.nodes[syntax::inside_brackets(file_, n.lhs)].kind == expr_kind::divide &&
        written_number(e.range) == 0.5 && ratio_of_gauge_readings(n.lhs)) [[unlikely]] {
        typed_term ratio;
        ratio.literal_begin = static_cast<std::uint32_t>(literals_.size());
        return ratio;
    }
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

// A symbol declared as a stress ("σ_v", or "overburden stress" in its description).
bool checker::names_a_stress_symbol(std::uint32_t k) const {
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, k)];
    if (n.kind != expr_kind::symbol)
        return false;
    const std::string_view name = text(n.range);
    const symbol_entry* e = symbols_.find(name);
    return e != nullptr && e->offset_unit == nullptr && names_a_stress(name, e->description);
}

// A product of one force above the line and lengths or areas below it, with numbers:
// a load over the area it acts on (F/A), no reading.
bool checker::force_over_area(std::uint32_t k) const {
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
bool checker::gradient_times_depth(std::uint32_t k) const {
    int gradients = 0;
    int lengths = 0;
    const bool other = for_each_factor(k, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number)
            return false;
        const symbol_entry* e =
            n.kind == expr_kind::symbol ? symbols_.find(text(n.range)) : nullptr;
        if (e == nullptr || !e->compact_dim)
            return true;
        // "SF*FG*D", a share of the fracture pressure (a safety factor of 0.9): a pure
        // number's symbol scales the column as a typed 0.9 does.
        if (e->compact_dim->is_dimensionless() && e->offset_unit == nullptr)
            return false;
        if (sign < 0)
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

// "Δp_f : kPa "friction loss"": a pressure its name or description declares a difference,
// which a gauge reads where the far end is open to the atmosphere.
bool checker::declared_pressure_difference(const operand& o) const {
    if (!o.type.known || o.type.point || o.type.offset != nullptr ||
        !(o.type.dim == pressure_dimension()))
        return false;
    // "Δp_i/249.1", "1000*Δp_f", "p_scr*MW_k/MW_o" (a kill sheet's final circulating
    // pressure): a declared difference times numbers and ratios (conversions, or a factor the
    // wrong way round, which the scale rule then names) is a difference still. The side is a
    // pressure, so the other factors of a declared pressure multiply to a pure number.
    // "p_g = -3.386*p_vac": a difference taken the other way is one still, as a vacuum
    // is a gauge reading below the atmosphere.
    std::uint32_t product = o.node;
    while (file_.nodes[product].kind == expr_kind::negate ||
           file_.nodes[product].kind == expr_kind::group)
        product = file_.nodes[product].lhs;
    std::uint32_t difference = syntax::no_index;
    const bool other = for_each_factor(product, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number ||
            (n.kind == expr_kind::negate && file_.nodes[n.lhs].kind == expr_kind::number))
            return false;
        // A cell whose row label says it is a difference ("Friction loss"), as a symbol's
        // name or words do.
        if (n.kind == expr_kind::reference) {
            const syntax::reference_value& r = file_.references[n.lhs];
            if (sign > 0 && difference == syntax::no_index && r.difference && r.dim &&
                compact_dimension::fitted(*r.dim) == std::optional(pressure_dimension())) {
                difference = at;
                return false;
            }
            return true;
        }
        if (n.kind != expr_kind::symbol)
            return true;
        const std::string_view name = text(n.range);
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr || e->offset_unit != nullptr || e->reading != 0)
            return true;
        if (sign > 0 && difference == syntax::no_index && e->compact_dim &&
            *e->compact_dim == pressure_dimension() && !names_a_stress(name, e->description)) {
            difference = at;
            return false;
        }
        // Beside the difference, only what its ratio can be made of: no second pressure.
        return e->compact_dim && *e->compact_dim == pressure_dimension();
    });
    return !other && difference != syntax::no_index;
}

// Whether a product has a symbol or a cell of the given dimension standing with `sign`
// (+1 above the line, -1 below it, 0 either).
bool checker::has_factor_of_dimension(std::uint32_t k, const compact_dimension& wanted,
                                      int sign) const {
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
std::optional<double> checker::scale_left_for_sum(std::uint32_t root, const typed_term& other,
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
        // "m*(h_fg + c_p*ΔT)/3600" in kW from kg/h: a conversion written beside the sum
        // scales the unit it must be in the other way from a symbol's.
        if (n.kind == expr_kind::number && plain_conversion_number(at)) {
            const double value = written_number(n.range);
            scale = sign > 0 ? scale * value : scale / value;
            return false;
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

void checker::check_formula(const syntax::formula& f) {
    current_ = &f;
    inner_scale_ratio_ = 0.0;
    // Only a sum on the right can be the chart's formula; most formulas stop at this test.
    if (f.side_count == 2 &&
        file_.nodes[file_.sides[f.first_side + 1].root].kind == expr_kind::add &&
        file_.nodes[file_.sides[f.first_side].root].kind == expr_kind::symbol &&
        read_moist_air_enthalpy_fit(f)) [[unlikely]]
        return;
    // Asked only once a new declaration may have named a barometer, or where one was found.
    if (!file_.quantities.empty() &&
        (!site_barometer_.name.empty() ||
         (!site_barometer_settled_ && site_barometer_declarations_ != file_.declarations.size())))
        [[unlikely]]
        if (declared_site_barometer() != nullptr)
            report_sea_level_atmosphere_in_products(f);
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
        const std::string_view sides_what = equation ? std::string_view("sides of this equation")
                                                     : std::string_view("sides of this limit");
        // "T_K = T_F": where a side is a reading on a scale whose zero differs from the
        // other's, that is the finding; the degrees' size alone would advise a wrong fix.
        const bool on_offset_scale =
            std::any_of(sides.begin(), sides.end(), [](const operand& side) {
                return side.type.known && side.type.offset != nullptr;
            });
        const std::size_t findings_before_scales = out_.size();
        if (on_offset_scale) {
            const std::size_t findings_before = out_.size();
            check_origins(sides, what);
            if (out_.size() == findings_before)
                check_scales(sides, sides_what, unit);
        } else if (const std::size_t findings_before = out_.size();
                   check_scales(sides, sides_what, unit)) {
            check_origins(sides, what);
            // A note (6356 read as the fan trade's constant) is no finding that settles the
            // formula: the rules for declared units still ask.
            const auto only_notes = [&] {
                return std::all_of(out_.begin() + static_cast<std::ptrdiff_t>(findings_before),
                                   out_.end(),
                                   [](const diagnostic& d) { return d.level == severity::note; });
            };
            if ((symbols_.unit_marks() &
                 (counts_revolutions | at_reference_conditions | apparent_power)) != 0 &&
                equation && only_notes())
                ask_of_marked_units(f, sides, out_.size() != findings_before);
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
            // "=C30*24*C38/1000" with C30 in Nm³/h and C38 in MJ/Sm³: two reference states
            // in one product, as a symbol's declared units are weighed.
            if (file_.functions == syntax::function_names::spreadsheet &&
                out_.size() == findings_before && equation && sides.size() == 2 &&
                sides[0].type.known && !is_gas_volume_or_flow(sides[0].type.dim)) [[unlikely]]
                report_reference_states_in_ratio(sides[1]);
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
            if (equation && sides.size() == 2 && out_.size() == findings_before &&
                (sides[0].type.absolute_pressure_difference ||
                 sides[1].type.absolute_pressure_difference)) [[unlikely]]
                report_absolute_set_to_difference(sides);
            if (equation && sides.size() == 2 && out_.size() == findings_before &&
                sides[0].type.point != sides[1].type.point && sides[0].type.known &&
                sides[0].type.dim == pressure_dimension()) [[unlikely]]
                report_difference_set_to_absolute(sides);
            if ((symbols_.unit_marks() & read_from_barometer) != 0 && equation &&
                sides.size() == 2 && out_.size() == findings_before && sides[0].type.known &&
                sides[0].type.dim == pressure_dimension()) [[unlikely]]
                report_barometer_reading_as_absolute(sides);
            if (equation && sides.size() == 2 && out_.size() == findings_before &&
                sides[0].type.known && sides[0].type.dim == velocity_squared_dim) [[unlikely]]
                report_air_enthalpy_datum_left_out(sides);
            if (equation && sides.size() == 2 && out_.size() == findings_before &&
                sides[0].type.known && sides[0].type.dim == length_dimension() &&
                (file_.nodes[sides[1].node].kind == expr_kind::divide ||
                 file_.nodes[sides[0].node].kind == expr_kind::divide ||
                 file_.nodes[sides[1].node].kind == expr_kind::multiply ||
                 file_.nodes[sides[1].node].kind == expr_kind::add)) [[unlikely]]
                report_head_from_absolute(sides);
            if (equation && sides.size() == 2 && out_.size() == findings_before &&
                sides[0].type.known &&
                (sides[0].type.dim == force_dim || sides[0].type.dim == area_dim)) [[unlikely]]
                report_force_from_absolute_pressure(sides);
        }
        if (equation && sides.size() == 2 && sides[0].type.known &&
            sides[0].type.dim.is_dimensionless() && !on_offset_scale &&
            (symbols_.unit_marks() & per_ton_of_cooling) != 0) [[unlikely]]
            report_cooling_efficiency_inverted(sides, findings_before_scales);
        return;
    }
    if (file_.functions == syntax::function_names::spreadsheet && sides.size() == 2 &&
        fit_constant_carries_cell_unit(sides)) [[unlikely]]
        return;
    std::string message = sides.size() == 2
                              ? fmt::format("the two sides of this {} differ in dimension", what)
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
        d.notes.push_back(
            {fmt::format("{}{} is {}", position, quote(sides[i].node), describe(sides[i].type.dim)),
             {},
             true});
    }
    note_bare_number_side(d, sides);
    if (!note_gravity_in_other_units(d, sides, a) && !note_constant_for_other_units(d, sides, a))
        note_acceleration_or_density_apart(d, sides, a);
    note_bare_quantity_apart(d, sides, a);
    note_count_of_periods_left_out(d, sides, a);
    note_unit_read_past_a_slash(d);
    if ((symbols_.unit_marks() & mass_fractions) != 0) [[unlikely]]
        note_fraction_beside_concentration(d, sides);
    if ((symbols_.unit_marks() & tons) != 0 && sides.size() == 2 && sides[0].type.known &&
        sides[1].type.known) [[unlikely]]
        note_ton_beside_power(d, sides);
}

// A spreadsheet formula: one side, whose type the front end compares with the unit
// written beside its cell.
void checker::mark_symbols_used(const syntax::formula& f) {
    syntax::search_formula(file_, f, [&](std::uint32_t, const syntax::expr_node& n) {
        if (n.kind == expr_kind::symbol)
            if (symbol_entry* e = symbols_.find(text(n.range)))
                e->used = true;
        return search_step::descend;
    });
}

std::optional<value_type> checker::check_value(const syntax::formula& f) {
    current_ = &f;
    const typed_term t = eval(file_.sides[f.first_side].root);
    if (!t.known)
        return std::nullopt;
    return value_type{t.dim.expand(), t.scale, t.offset, t.zero, t.exact_scale, t.numeric};
}

// 'text' for messages, shortened so one long term cannot swamp a line.
std::string checker::quote(std::uint32_t node) const {
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

diagnostic& checker::report(std::string_view rule, std::string message, span where) {
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
double checker::unit_as_written(const typed_term& t) const {
    double u = t.scale;
    // Only the numbers that convert: the 0.55 of 0.55*RH_pct/100 is a coefficient.
    for (std::uint32_t l = 0; l < t.literal_count; ++l)
        if (const scale_literal& number = literals_[t.literal_begin + l];
            looks_like_conversion(number, true))
            u /= std::pow(number.value, number.exponent);
    return u > 0 && std::isfinite(u) ? u : std::numeric_limits<double>::quiet_NaN();
}

typed_term checker::eval_quantity(const syntax::expr_node& n) const {
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

typed_term checker::number_type(const number_reading& reading) {
    typed_term t;
    t.numeric = true;
    t.value = reading.value;
    t.zero = reading.zero;
    return t;
}

typed_term checker::eval_number(const syntax::expr_node& n, std::uint32_t index) {
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
typed_term checker::eval_symbol(const syntax::expr_node& n) {
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

typed_term checker::first_use_type(symbol_entry* entry, std::string_view name) {
    typed_term t = declared_type(entry, name);
    // A dimension past the 16-bit form is held in this check's arena only, so a type
    // that refers to it must not outlive the check.
    if (!entry->dim || entry->compact_dim)
        entry->checked_type = t;
    return t;
}

typed_term checker::report_undeclared(const syntax::expr_node& n, std::string_view name) {
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
                list += fmt::format("{}'{}'", i == 0 ? "" : (i + 1 == near.size() ? " or " : ", "),
                                    near[i]);
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

// Worked out on a symbol's first use and kept in its entry.
typed_term checker::declared_type(symbol_entry* entry, std::string_view name) {
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
             (t.dim == pressure_dimension() && !names_a_stress(name, entry->description) &&
              !counts_below_the_barometer(name, entry->description))) &&
            !difference_unit && !names_a_difference(name, entry->description);
        entry->reading = reading ? 1 : 0;
        t.point = reading;
    }
    return t;
}

// "ΔT_lm = (ΔT_1 - ΔT_2)/(ln(ΔT_1) - ln(ΔT_2))", "=LN(C5)-LN(C6)": a difference of the
// logarithms of two quantities of one dimension is the logarithm of their ratio, whatever
// their unit, so long as it is the same one (Kern, Process Heat Transfer, ch. 5, from memory).
// Read so where each argument is a declared symbol or a cell, neither on an offset scale; empty
// otherwise, and the sum is checked as any other.
std::optional<typed_term> checker::eval_log_difference(std::uint32_t index) {
    const syntax::expr_node& n = file_.nodes[index];
    const bool sheet = file_.functions == syntax::function_names::spreadsheet;
    std::array<std::uint32_t, 2> arguments{};
    std::array<std::optional<dimension>, 2> dims;
    std::string_view function;
    for (std::size_t k = 0; k < 2; ++k) {
        const syntax::expr_node& call =
            file_.nodes[syntax::inside_brackets(file_, k == 0 ? n.lhs : n.rhs)];
        if (call.kind != expr_kind::call || call.rhs != 1)
            return std::nullopt;
        const std::string_view name = text(call_name_range(call));
        if ((!function.empty() && name != function) ||
            (name != "ln" && name != "log10" && name != "LN" && name != "LOG10" &&
             !(sheet && name == "LOG")))
            return std::nullopt;
        function = name;
        arguments[k] = syntax::inside_brackets(file_, file_.call_args[call.lhs]);
        const syntax::expr_node& a = file_.nodes[arguments[k]];
        if (a.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(a.range));
            if (e == nullptr || e->offset_unit != nullptr)
                return std::nullopt;
            dims[k] = e->dim;
        } else if (a.kind == expr_kind::reference) {
            const syntax::reference_value& r = file_.references[a.lhs];
            if (r.offset != nullptr && !r.difference)
                return std::nullopt;
            dims[k] = r.dim;
        } else {
            return std::nullopt;
        }
        if (!dims[k] || dims[k]->is_dimensionless())
            return std::nullopt;
    }
    if (!(*dims[0] == *dims[1]))
        return std::nullopt;
    const std::size_t base = operands_.size();
    const std::size_t types_base = types_.size();
    const std::size_t literal_base = literals_.size();
    for (const std::uint32_t a : arguments)
        operands_.push_back({push_operand_type(a, types_base, 0), a});
    const scratch_region region(operands_, base, types_, types_base);
    typed_term result;
    double unit = 1.0;
    const std::string of = fmt::format("{} in a difference of logarithms", function);
    if (!check_scales(region.view(), {"arguments", of}, unit))
        result.scale = std::numeric_limits<double>::quiet_NaN();
    cut_literals_to(literal_base);
    return result;
}

typed_term checker::eval_sum(std::uint32_t index) {
    if (file_.nodes[index].kind == expr_kind::subtract &&
        file_.nodes[file_.nodes[index].rhs].kind == expr_kind::call) [[unlikely]]
        if (std::optional<typed_term> logs = eval_log_difference(index))
            return *logs;
    if (file_.nodes[index].kind == expr_kind::subtract &&
        file_.nodes[file_.nodes[index].rhs].kind == expr_kind::number) [[unlikely]] {
        if (std::optional<typed_term> reading = eval_reading_from_inferred_zero(index))
            return *reading;
        report_lethality_reference_on_other_scale(index);
    } else if (file_.nodes[index].kind == expr_kind::subtract &&
               file_.nodes[file_.nodes[index].lhs].kind == expr_kind::number) [[unlikely]] {
        report_lethality_reference_on_other_scale(index); // "(121.1 - T)/z", a D value's
    }
    const bool prefer_dimensionless = index == prefer_dimensionless_;
    // Walk the left spine iteratively: a long sum must not recurse once per term.
    const std::size_t spine_base = spine_.size();
    std::uint32_t n = index;
    while (file_.nodes[n].kind == expr_kind::add || file_.nodes[n].kind == expr_kind::subtract) {
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
    if (!a.odd.empty() && !prefer_dimensionless && read_gravity_numbers_either_way(base, a, index))
        a = find_agreement(terms, prefer_dimensionless);
    if (!a.odd.empty() && !prefer_dimensionless && read_column_and_atmosphere(base, index))
        a = find_agreement(terms, prefer_dimensionless);
    if (!a.odd.empty() && !prefer_dimensionless && a.reference &&
        *a.reference == velocity_squared_dim && read_air_enthalpy_datum(base)) [[unlikely]]
        a = find_agreement(terms, prefer_dimensionless);
    // "M = M_tm + H*t" with M in kN·m, "W_s = ρ_s*A_s + ρ_c*A_c + m_c - B_w" in N/m: the
    // terms with the other side's dimension are right, however few and wherever they are.
    if (!a.odd.empty() && a.reference && index == side_hint_node_ && side_hint_ != nullptr &&
        side_hint_->known && !(side_hint_->dim == *a.reference)) [[unlikely]] {
        const bool odd_share_the_side = std::all_of(a.odd.begin(), a.odd.end(), [&](std::size_t i) {
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
            message = fmt::format("{} does not have the dimension of the other terms of this sum",
                                  quote(terms[first_odd].node));
        }
        diagnostic& d = report(rules::sum_mismatch, std::move(message),
                               file_.nodes[terms[first_odd].node].range);
        explain(d, terms, a, "terms");
        note_atmosphere_in_another_unit(d, terms, a);
        if (a.reference && *a.reference == temperature_dimension()) [[unlikely]]
            note_zero_added_to_converted_temperature(d, terms, a);
        note_scale_zero_beside_difference(d, terms, a);
        // "η = 1 - C_out/C_in", mg/L over ppm: the term is a density where a fraction belongs.
        if (terms.size() == 2) [[unlikely]]
            note_fraction_beside_concentration(d, terms);
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
        if (result.value && !result.value->is_zero()) {
            literals_.push_back(read_literal(text(file_.nodes[index].range),
                                             result.value->to_double(), index, result.value));
            // "(1 - 0.70)", a share, is no table's unit ratio, whatever its value comes near
            // (0.30 beside 0.3048 m per ft): it is weighed as a coefficient.
            literals_.back().factor_like = false;
            literals_.back().table_digits = false;
        }
        return result;
    }
    if (result.dim == pressure_dimension() && terms.size() <= 4) [[unlikely]]
        report_barometer_added_to_absolute(terms);
    if (offset_term != nullptr && result.dim == pressure_dimension() && terms.size() <= 4 &&
        report_share_of_gauge_beside_absolute(terms)) [[unlikely]] {
        cut_literals_to(literal_base);
        result = unknown_type();
        return result; // as above
    }
    if (offset_term != nullptr) {
        // "p_kPa = p_bar_g + p_b_kPa": the other side says which term is off here too.
        sum_side_hint_ = index == side_hint_node_ ? side_hint_ : nullptr;
        sum_checked_ = index;
        result = finish_offset_sum(terms, result, literal_base, index);
        sum_side_hint_ = nullptr;
        sum_checked_ = syntax::no_index;
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
    sum_common_numbers_ = {common_base, common_numbers_.size()};
    result.scale = check_scales(terms, "terms of this sum", unit, &result.exact_scale)
                       ? unit
                       : std::numeric_limits<double>::quiet_NaN();
    sum_side_hint_ = nullptr;
    sum_checked_ = syntax::no_index;
    sum_common_numbers_ = {};
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
    // "p_d = ρ*g*h_s + Δp_f": the columns and the declared drops a blower or a pump
    // works against add up to what its discharge gauge reads.
    // So does a margin typed with its unit beside them, "ρ_w*{g_n}*H/1e5 + 0.3 {bar}" (common
    // practice for an expansion vessel's fill pressure): a difference as they are.
    if (points == 0 && result.dim == pressure_dimension()) [[unlikely]] {
        // Well below any atmosphere (40 kPa, some 7000 m up): "+ 101.325 {kPa}" is none.
        const auto typed_margin = [&](const operand& t) {
            const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, t.node)];
            if (n.kind != expr_kind::quantity || file_.quantities[n.lhs].constant)
                return false;
            const double value = quantity_si_value(n);
            return std::isfinite(value) && std::abs(value) < 40e3;
        };
        result.absolute_pressure_difference =
            std::all_of(terms.begin(), terms.end(),
                        [&](const operand& t) {
                            return !t.type.point &&
                                   (t.type.absolute_pressure_difference ||
                                    declared_pressure_difference(t) || typed_margin(t));
                        }) &&
            !std::all_of(terms.begin(), terms.end(), typed_margin);
    }
    return result;
}

// The numbers taken out go on common_numbers_, for the sum to put on the literal stack once
// its terms are weighed.
void checker::factor_out_common_numbers_of(std::span<const operand> terms) {
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

// A product's factors, multiplied out. Every return is of `result`, so that it is built
// in the caller's return object rather than copied there (a type is 112 bytes).
typed_term checker::eval_factors(std::uint32_t index) {
    const std::size_t spine_base = spine_.size();
    std::uint32_t n = index;
    while (file_.nodes[n].kind == expr_kind::multiply || file_.nodes[n].kind == expr_kind::divide) {
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
        else if (divided && factor->numeric && result.known && !result.numeric &&
                 file_.nodes[syntax::inside_brackets(file_, op.rhs)].kind == expr_kind::subtract &&
                 report_oxygen_correction_upside_down(op.lhs, op.rhs)) [[unlikely]] {
            result.scale /= 0.01;
            result.exact_scale = exact_product(result.exact_scale, rational(100), false);
        }
        // (R_2 - R_1)/R_1*(235 + θ_1): a winding's temperature from its inferred zero of
        // resistance, times a ratio, is a rise; and so is each bracket of the correction
        // R_2 = R_1*(235 + θ_2)/(235 + θ_1) (IEC 60076-1's load loss at 75 °C, from memory),
        // a temperature counted from the conductor's zero of resistance.
        if (factor->offset != nullptr && result.known && !result.numeric &&
            result.offset == nullptr && from_inferred_zero_of_resistance(op.rhs)) {
            if (factor != reinterpret_cast<const typed_term*>(evaluated))
                factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
            read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
            // "R_t*(235 + 75)/(235 + θ_t)", a test's resistance corrected to 75 °C (IEC
            // 60076-1, from memory): the reference's rise typed in numbers over the reading's.
            if (divided && for_each_factor(op.lhs, [&](std::uint32_t at, int sign) {
                    return sign > 0 && from_inferred_zero_of_resistance(at, true);
                }))
                result.dim = result.dim * temperature_dimension();
        } else if (divided && factor->numeric && result.known && !result.numeric &&
                   file_.nodes[syntax::inside_brackets(file_, op.rhs)].kind == expr_kind::add &&
                   reference_rise_from_inferred_zero(op.lhs, op.rhs)) [[unlikely]] {
            if (factor != reinterpret_cast<const typed_term*>(evaluated))
                factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
            typed_term& rise = *reinterpret_cast<typed_term*>(evaluated);
            rise.numeric = false;
            rise.value.reset();
            rise.dim = temperature_dimension();
            factor = &rise;
        } else if (!divided && result.offset != nullptr && factor->known && !factor->numeric &&
                   factor->offset == nullptr && factor->dim.is_dimensionless() &&
                   from_inferred_zero_of_resistance(n) && k == spine_.size()) {
            read_as_rise(result);
        } else if (divided && result.offset != nullptr && factor->offset != nullptr &&
                   k == spine_.size() && from_inferred_zero_of_resistance(n) &&
                   from_inferred_zero_of_resistance(op.rhs)) [[unlikely]] {
            // "(235 + θ_2)/(235 + θ_1)", the ratio of resistances written as its own side.
            read_as_rise(result);
            if (factor != reinterpret_cast<const typed_term*>(evaluated))
                factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
            read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
        }
        if (!divided && enthalpy_side_ != syntax::no_index &&
            (factor->offset != nullptr) != (result.offset != nullptr)) [[unlikely]] {
            if (factor->offset != nullptr && enthalpy_above_ice_point(op.rhs, *factor, result)) {
                if (factor != reinterpret_cast<const typed_term*>(evaluated))
                    factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
                read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
            } else if (result.offset != nullptr &&
                       enthalpy_above_ice_point(offset_node, result, *factor)) {
                read_as_rise(result);
            }
        }
        // R_0*(1 + α*t) with R_0 at 0 °C: see reading_from_ice_point_reference.
        if (!divided && (factor->offset != nullptr) != (result.offset != nullptr)) [[unlikely]] {
            if (factor->offset != nullptr && is_celsius(factor->offset) &&
                ((result.known && result.dim == per_kelvin) ||
                 (!result.known && result.inferred)) &&
                reading_from_ice_point_reference(op.rhs)) {
                if (factor != reinterpret_cast<const typed_term*>(evaluated))
                    factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
                read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
            } else if (result.offset != nullptr && is_celsius(result.offset) &&
                       ((factor->known && factor->dim == per_kelvin) ||
                        (!factor->known && factor->inferred)) &&
                       reading_from_ice_point_reference(offset_node)) {
                read_as_rise(result);
            }
        }
        if (divided && factor->offset == nullptr && factor->point &&
            factor->dim == temperature_dimension()) [[unlikely]]
            report_celsius_fit_beside_kelvins(op.rhs);
        if (divided && factor->offset != nullptr &&
            (fitted_on_scale(op.lhs, op.rhs, result, *factor) ||
             empirical_over_reading(op.lhs, *factor))) {
            if (!is_celsius(factor->offset)) [[unlikely]]
                report_celsius_fit_on_other_scale(op.rhs, *factor->offset);
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
        // α*(T - 20): a coefficient per kelvin times a reading less its reference.
        if (!divided && ((t.reading_or_difference && result.known && result.dim == per_kelvin) ||
                         (k == spine_.size() && result.reading_or_difference && t.known &&
                          t.dim == per_kelvin))) [[unlikely]]
            report_reference_on_other_scale(t.reading_or_difference ? op.rhs : n);
        if (divided)
            for (std::uint32_t i = 0; i < t.literal_count; ++i)
                literals_[t.literal_begin + i].exponent = -literals_[t.literal_begin + i].exponent;
        // Nearly every factor, and the product so far, is neither a reading nor on an
        // offset scale, where the rules below have nothing to do but say so.
        if (result.offset == nullptr && t.offset == nullptr && !result.point && !t.point) {
            result.origin = 0.0;
            result.origin_tolerance = 0.0;
        } else {
            // An offset value may be scaled by a pure number (the mean (T_1 + T_2)/2), not
            // multiplied by a quantity, nor by a `?` coefficient (which has a dimension).
            const auto scales_a_reading = [](const typed_term& reading, const typed_term& other) {
                return reading.known && reading.offset != nullptr &&
                       (other.known ? !other.numeric : other.inferred);
            };
            const bool left_off = scales_a_reading(result, t);
            // A number over a reading (1/T_a in Arrhenius's 1/T_1 - 1/T_2) is no scaling.
            const bool right_off =
                (scales_a_reading(t, result) && !(result.known && result.numeric && !divided)) ||
                (divided && t.known && t.offset != nullptr && result.known && result.numeric);
            const bool gauge_over_something =
                (left_off || (right_off && !divided)) &&
                compact_dimension((left_off ? result : t).offset->dim()) == pressure_dimension();
            // A = F/p_g: a load over a gauge pressure (a tyre's contact area, a cylinder's
            // bore), one gauge only; p_1g/p_2g stays a ratio of readings.
            const bool gauge_divisor = !left_off && right_off && divided && !gauge_in_product &&
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
                std::abs((divided ? t.value->to_double() * result.scale / result.offset->factor
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
    if (pairs.any() && !(index == side_hint_node_ && side_hint_ != nullptr && side_hint_->known &&
                         result.known && side_hint_->dim == result.dim))
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
        // So is "p_d*1000/(ρ*9.81) + z_g" before the sum reads its 9.81 as g.
        const bool head_without_g = result.known && result.dim == velocity_squared_dimension() &&
                                    ((index == side_hint_node_ && side_hint_ != nullptr &&
                                      side_hint_->known && side_hint_->dim == length_dimension()) ||
                                     divides_by_gravity_number(result.literal_begin));
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
        // Not beside a logarithm: p*V̇*ln(p_2/p_1) is a gas's isothermal compression,
        // which takes the absolute pressure.
        // Nor beside a pressure ratio raised to a power that is no whole number,
        // k/(k - 1)*p_1*V̇*(r^((k - 1)/k) - 1): a gas's adiabatic compression, which takes the
        // absolute suction pressure too (common practice; GPSA, compressors, from memory).
        const auto ratio_raised = [&](std::uint32_t at) {
            return syntax::search_subtree(
                file_, at, [&](std::uint32_t, const syntax::expr_node& n) {
                    return n.kind == expr_kind::power &&
                                   (file_.nodes[n.rhs].kind != expr_kind::number ||
                                    !written_whole(text(file_.nodes[n.rhs].range)))
                               ? search_step::found
                               : search_step::descend;
                });
        };
        const bool gas_compression =
            result.known && result.dim == power_dim &&
            for_each_factor(index, [&](std::uint32_t at, int) {
                const syntax::expr_node& f = file_.nodes[at];
                if (file_.nodes[syntax::inside_brackets(file_, at)].kind == expr_kind::subtract)
                    return ratio_raised(at);
                if (f.kind != expr_kind::call)
                    return false;
                const std::string_view name = text(call_name_range(f));
                return name == "ln" || name == "LN" || name == "log" || name == "LOG";
            });
        const bool hydraulic_power = result.known && result.dim == power_dim && !gas_compression &&
                                     index == side_hint_node_ && side_hint_ != nullptr &&
                                     side_hint_->known && side_hint_->dim == power_dim &&
                                     has_factor_of_dimension(index, volume_flow_dim, 1);
        // BP = 100*p_bk/p_set in %: API 520's back pressure, overpressure and accumulation
        // are percentages of the set pressure, a gauge reading over a gauge reading by
        // definition (API 520 Part I, from memory); a ratio in a pure number stays a gas law's.
        const bool percent_of_gauge =
            result.known && result.dim.is_dimensionless() && index == side_hint_node_ &&
            side_hint_ != nullptr && side_hint_->known && side_hint_->dim.is_dimensionless() &&
            side_hint_->scale == 0.01 && file_.nodes[index].kind == expr_kind::divide &&
            holds_gauge(file_.nodes[index].lhs) && holds_gauge(file_.nodes[index].rhs);
        if (result.known &&
            (result.dim == length_dimension() || result.dim == force_dimension() || wall_stress ||
             ring_tension || jet || bearing_area || head_without_g || column_gradient ||
             hydraulic_power || percent_of_gauge || gauge_over_modulus(index))) {
            result.offset = nullptr;
            result.point = false;
            result.origin = 0.0;
            result.origin_tolerance = 0.0;
            result.absolute_pressure_difference = wall_stress;
        } else {
            report_offset(gauge_in_product->node, *gauge_in_product->unit, gauge_in_product->where);
            // z + h_f + p_g*1000/ρ: over a density alone a gauge reading gives an energy per
            // mass; where a head was meant, the slip is the missing g, not the zero.
            if (result.known && result.dim == velocity_squared_dimension())
                out_.back().notes.insert(
                    out_.back().notes.begin(),
                    {"if a head was meant, g is missing: p/(\u03C1*g) is a head, which a "
                     "gauge reading may give as it is",
                     {}});
            // ṁ/ρ*p_g into a power: a pump's power takes the pressure it adds, which a gauge
            // gives alone only where the suction is open to the atmosphere.
            else if (result.known && result.dim == power_dim && !gas_compression)
                out_.back().notes.insert(
                    out_.back().notes.begin(),
                    {"if a pump's or a fan's power was meant, it takes the pressure it adds, "
                     "the discharge less the suction (p_d - p_s), not the atmosphere added",
                     {}});
            result = unknown_type();
            return result; // as above
        }
    }
    // A column's ρ*9.81*h (a sheet's, where g is typed as a number) is one as ρ*g*h is.
    if (!result.known)
        result = unknown_type(result.inferred);
    else if (!result.point && result.dim == pressure_dimension() &&
             (has_gravity || multiplies_by_gravity_number(result.literal_begin)))
        result.absolute_pressure_difference = true;
    return result;
}

// Out of line, so that eval's frame, entered for every node, stays small.
// Whether a product, whose numbers are on the stack from `literals_begin`, divides by a number
// that is standard gravity as calcs round it (9.81,
// 9.807, 32.2, 32.17; g_n = 9.80665 m/s² = 32.174 ft/s², SI Brochure 9th ed., NIST SP 811
// (2008), B.8), which the sum around it will read as g.
bool checker::divides_by_gravity_number(std::uint32_t literals_begin) const {
    for (std::size_t i = literals_begin; i < literals_.size(); ++i)
        if (literals_[i].exponent == -1.0 && is_typed_gravity(literals_[i]))
            return true;
    return false;
}

// The same for a product that multiplies by such a number (ρ*9.81*h).
bool checker::multiplies_by_gravity_number(std::uint32_t literals_begin) const {
    for (std::size_t i = literals_begin; i < literals_.size(); ++i)
        if (literals_[i].exponent == 1.0 && is_typed_gravity(literals_[i]))
            return true;
    return false;
}

// 9.81, 9.807, 32.2, 32.17: standard gravity as calcs round it, in m/s² or ft/s².
bool checker::is_typed_gravity(const scale_literal& l) {
    return std::abs(l.value / 9.80665 - 1.0) < 2e-3 || std::abs(l.value / 32.174 - 1.0) < 2e-3;
}

// "30", "360": a number written as a whole number, digits alone.
bool checker::written_whole(std::string_view written) {
    return !written.empty() &&
           std::all_of(written.begin(), written.end(), [](char c) { return c >= '0' && c <= '9'; });
}

typed_term checker::eval_product(std::uint32_t index) {
    if (file_.nodes[index].kind == expr_kind::divide &&
        file_.nodes[file_.nodes[index].lhs].kind == expr_kind::group) [[unlikely]]
        if (const auto mean = weighted_mean(index))
            return *mean;
    if (file_.functions == syntax::function_names::spreadsheet &&
        file_.nodes[index].kind == expr_kind::divide &&
        file_.nodes[file_.nodes[index].lhs].kind == expr_kind::call) [[unlikely]]
        if (const auto mean = sheet_weighted_mean(index))
            return *mean;
    const auto literals_before = static_cast<std::uint32_t>(literals_.size());
    typed_term t = eval_factors(index);
    if (literals_.size() >= literals_before + 2) [[unlikely]]
        read_ratio_of_whole_numbers(literals_before);
    if (literals_.size() > literals_before && t.known && t.dim.is_dimensionless() &&
        std::abs(t.scale * 180.0 / std::numbers::pi - 1.0) < 1e-12) [[unlikely]]
        read_angle_over_right_angles(t, literals_before, index);
    return t;
}

// "θ*(...)/(90*n_r*n_c)" with θ in degrees (Converse-Labarre's pile group efficiency),
// "2*π*r*θ/360" (an arc): an angle in degrees over a right angle, a half or a whole turn typed as
// 90, 180 or 360 is a ratio of angles, the number being in degrees too. Not beside π, where 180
// converts degrees to radians (θ*π/180).
void checker::read_angle_over_right_angles(typed_term& t, std::uint32_t literals_begin,
                                           std::uint32_t index) {
    // "0.8*(60 - α)/30", EN 1991-1-3's snow shape coefficient for a roof between 30° and 60°:
    // a range of angles over another, the numbers in degrees as the reading beside them is.
    const bool angle_range = for_each_factor(index, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        return sign > 0 && (n.kind == expr_kind::add || n.kind == expr_kind::subtract) &&
               (file_.nodes[syntax::inside_brackets(file_, n.lhs)].kind == expr_kind::number ||
                file_.nodes[syntax::inside_brackets(file_, n.rhs)].kind == expr_kind::number);
    });
    scale_literal* turn = nullptr;
    for (std::size_t i = literals_begin; i < literals_.size(); ++i) {
        scale_literal& l = literals_[i];
        if (file_.nodes[l.node].kind == expr_kind::pi ||
            std::abs(l.value / std::numbers::pi - 1.0) < 1e-3)
            return;
        const std::string_view written = text(file_.nodes[l.node].range);
        if (l.exponent == -1.0 && (written == "90" || written == "180" || written == "360" ||
                                   (angle_range && written_whole(written))))
            turn = &l;
    }
    if (turn == nullptr)
        return;
    read_as_quantity(*turn);
    t.scale = 1.0;
    t.exact_scale = rational(1);
}

// "X_60 = X_50*60/50", "n*75/60": two whole numbers, one over the other, within a factor of
// two of each other are a ratio the formula scales by (two mains frequencies, two speeds),
// not conversions: the 60 is no minutes beside the 50. Each is read as a plain coefficient.
// 9/5 and 5/9 are the degrees' conversion; powers of ten (100*p_bar*(Q/60)) and numbers of
// four digits (1000/1233 for m³ per acre-foot) are left to the conversion rules.
void checker::read_ratio_of_whole_numbers(std::uint32_t literals_begin) {
    // The numbers' values first, their text only for a pair that fits.
    const auto small_whole = [](const scale_literal& l) {
        return !l.power_of_ten && !l.table_digits && l.value != 1.0 && l.value < 1000.0 &&
               l.value == std::floor(l.value);
    };
    const auto whole_as_written = [&](const scale_literal& l) {
        return written_whole(text(file_.nodes[l.node].range));
    };
    // The yard's and the foot's counts (3 ft, 12 in and 36 in a yard, 9 and 144 square, 27
    // and 1728 cubic; NIST SP 811 (2008), B.8): "*9/12" turns lb/ft³ into lb/(yd²·in), two
    // conversions, not a ratio of speeds.
    const auto customary_count = [](double v) {
        return v == 3.0 || v == 9.0 || v == 12.0 || v == 27.0 || v == 36.0 || v == 144.0 ||
               v == 1728.0;
    };
    // "V_yr = 52*V_f*t_test/60" with V_f in L/h and t_test in min: where the formula counts
    // in two units of the clock, 60 (or 24) is the conversion between them, and 52 tests a
    // year a count beside it, not one of a ratio of speeds.
    unsigned clocks = 0;
    const auto converts_clock = [&](const scale_literal& l) {
        if (l.value != 60.0 && l.value != 24.0)
            return false;
        if (clocks == 0)
            clocks = clock_units_of_formula() | 0x100; // asked once; the bit marks it asked
        const bool minute = (clocks & clock_minute) != 0;
        const bool hour = (clocks & clock_hour) != 0;
        const bool day = (clocks & clock_day) != 0;
        return l.value == 60.0 ? minute && (hour || day) : day && (hour || minute);
    };
    for (std::size_t i = literals_begin; i < literals_.size(); ++i) {
        scale_literal& over = literals_[i];
        if (over.exponent != 1.0 || !small_whole(over))
            continue;
        for (std::size_t k = literals_begin; k < literals_.size(); ++k) {
            scale_literal& under = literals_[k];
            const double ratio = over.value / under.value;
            if (under.exponent != -1.0 || !small_whole(under) || !(ratio > 0.5 && ratio < 2.0) ||
                ratio == 1.0 || std::abs(ratio - 1.8) < 1e-12 ||
                (customary_count(over.value) && customary_count(under.value)) ||
                converts_clock(over) || converts_clock(under) ||
                std::abs(ratio * 1.8 - 1.0) < 1e-12 || !whole_as_written(over) ||
                !whole_as_written(under))
                continue;
            read_as_quantity(over);
            read_as_quantity(under);
            break;
        }
    }
}

// A scale raised to a power: most are SI units, whose scale 1 stays 1 (as std::pow gives
// for any exponent) without a call.
double checker::unit_power(double scale, double exponent) {
    return scale == 1.0 ? 1.0 : std::pow(scale, exponent);
}

typed_term checker::apply_power(const typed_term& base, const typed_term& exponent,
                                std::uint32_t base_node, std::uint32_t exponent_node) {
    // Every return is of `result`, so that it is built in the caller's return object.
    typed_term result;
    if (counts_degrees_above_a_reference(base, exponent)) {
        result = temperature_correction(base, exponent, exponent_node);
        return result;
    }
    // t^2 in R_0*(1 + A*t + B*t^2): see reading_from_ice_point_reference.
    if (base.offset != nullptr && base.known && is_celsius(base.offset) && exponent.value &&
        exponent.value->den() == 1 && reading_from_ice_point_reference(base_node)) [[unlikely]] {
        typed_term rise = base;
        read_as_rise(rise);
        result = apply_power(rise, exponent, base_node, exponent_node);
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
            report_units_not_cancelling({base, base_node},
                                        fmt::format("the base {}", quote(base_node))) == nullptr;
    // The exponent's own numbers are not factors of the power; the base's are, raised.
    cut_literals_to(base.literal_begin + base.literal_count);
    // "10^(-13.26)", a solubility product from its pK: a number raised to a fitted power is a
    // value, no conversion that a power of ten could be.
    if (exponent.value && base.numeric && exponent.value->den() > 3)
        cut_literals_to(base.literal_begin);
    else if (exponent.value)
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
            fmt::format("{} has a dimension, so its exponent must be a constant number, but {} {}",
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
    // p = (q/K)^2, a sprinkler's or a valve's flow over its K-factor (EN 12845, NFPA 13; common
    // practice): a pressure made by raising something else is the drop across the orifice, a
    // difference, which a gauge reading may equal.
    if (result.dim == pressure_dimension() && !(base.dim == pressure_dimension()) && !base.point)
        result.absolute_pressure_difference = true;
    return result;
}

// k_T = k_20*θ^(T - 20): the trades' temperature correction of a rate (the van 't Hoff-
// Arrhenius form of water and wastewater treatment; common practice) raises a number θ to
// the kelvins, or degrees Celsius, above a reference temperature. θ is per kelvin, a unit
// the formula leaves unwritten, so the exponent must count kelvins: a difference of
// readings, or a reading less its reference.
bool checker::counts_degrees_above_a_reference(const typed_term& base, const typed_term& exponent) {
    return base.known && exponent.known && base.dim.is_dimensionless() && base.offset == nullptr &&
           !exponent.numeric && exponent.dim == temperature_dimension() &&
           (exponent.reading_or_difference ||
            (!exponent.point && exponent.offset == nullptr && exponent.zero_of == nullptr));
}

typed_term checker::temperature_correction(const typed_term& base, const typed_term& exponent,
                                           std::uint32_t exponent_node) {
    // "θ^((t_F - 68)/1.8)": the exponent's numbers, which may take °F degrees to kelvins.
    double numbers = 1.0;
    for (std::size_t k = 0; k < exponent.literal_count; ++k) {
        const scale_literal& l = literals_[exponent.literal_begin + k];
        numbers *= std::pow(l.value, l.exponent);
    }
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
                        quote(exponent_node), format_factor(reference), format_factor(reference)),
            file_.nodes[exponent_node].range);
        add_term(d, {exponent, exponent_node});
        d.notes.push_back({"write the reading in °C, or subtract the reference in kelvins "
                           "(T - 293.15 for 20 °C)",
                           {}});
        result = unknown_type();
        return result;
    }
    // θ^(θ_c - 293): a °C reading less a reference in kelvins.
    const std::size_t findings_before = out_.size();
    report_reference_on_other_scale(exponent_node);
    if (out_.size() != findings_before) {
        result = unknown_type();
        return result;
    }
    // A reading converted to another scale ((T_F - 32)/1.8) counts that scale's degrees.
    const double degree = exponent.offset != nullptr ? exponent.offset->factor : exponent.scale;
    // The numbers written make the degrees kelvins where they are the degree's size: 1/1.8
    // exactly, or 5/9 printed 0.5556, for °F (NIST SP 811 (2008), B.9).
    const bool converted_to_kelvins = std::isfinite(degree) && std::isfinite(numbers) &&
                                      numbers != 1.0 && degree > 0.0 &&
                                      std::abs(numbers / degree - 1.0) < 2e-4;
    if (std::isfinite(degree) && (std::abs(degree - 1.0) < 1e-9 || converted_to_kelvins)) {
        // "θ^(20 - T_w)": the reference less the reading counts the degrees below it; a rate
        // that rises with temperature takes θ^(T - 20) (common practice).
        const syntax::expr_node& e = file_.nodes[syntax::inside_brackets(file_, exponent_node)];
        const bool below =
            e.kind == expr_kind::subtract &&
            file_.nodes[syntax::inside_brackets(file_, e.lhs)].kind == expr_kind::number;
        diagnostic& d =
            report(rules::temperature_correction,
                   fmt::format("the exponent {} is read as the kelvins (degrees Celsius) {} a "
                               "reference temperature, as in a rate's temperature correction",
                               quote(exponent_node), below ? "below" : "above"),
                   file_.nodes[exponent_node].range);
        d.level = severity::note;
        d.notes.push_back({"the number raised to it is then per kelvin: the formula holds "
                           "only with the reference on the scale it was fitted on, most "
                           "often 20 °C",
                           {}});
        if (below)
            d.notes.push_back({"a rate that rises with temperature takes the reading less the "
                               "reference, θ^(T - 20)",
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
double checker::reference_subtracted(std::uint32_t node) const {
    node = syntax::inside_brackets(file_, node);
    const syntax::expr_node& n = file_.nodes[node];
    if (n.kind != expr_kind::subtract)
        return 0.0;
    if (file_.nodes[n.rhs].kind == expr_kind::number)
        return written_number(file_.nodes[n.rhs].range);
    if (file_.nodes[n.lhs].kind == expr_kind::number)
        return written_number(file_.nodes[n.lhs].range);
    // "T_w - 20 {K}": a reference typed in kelvins (its SI value) counts from there as well.
    const std::uint32_t typed = syntax::inside_brackets(file_, n.rhs);
    if (file_.nodes[typed].kind == expr_kind::quantity)
        if (const double kelvins = quantity_si_value(file_.nodes[typed]); std::isfinite(kelvins))
            return kelvins;
    return 0.0;
}

// b^e exactly, for the whole exponents that constant exponents such as 2^3 need.
std::optional<rational> checker::exact_power(const std::optional<rational>& base,
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
span checker::call_name_range(const syntax::expr_node& n) const {
    const std::string_view t = text(n.range);
    const std::size_t begin = t.find_first_not_of("( \t\r\n\\");
    std::size_t end = t.find('(', begin);
    while (end > begin && (t[end - 1] == ' ' || t[end - 1] == '\t'))
        --end;
    return {n.range.begin + static_cast<std::uint32_t>(begin),
            n.range.begin + static_cast<std::uint32_t>(end)};
}

// "p_h/p_r" with both in psig: one gauge reading over another, on one scale and in one unit.
bool checker::ratio_of_gauge_readings(std::uint32_t node) {
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, node)];
    if (n.kind != expr_kind::divide)
        return false;
    const auto gauge = [&](std::uint32_t k) -> symbol_entry* {
        const syntax::expr_node& s = file_.nodes[syntax::inside_brackets(file_, k)];
        if (s.kind != expr_kind::symbol)
            return nullptr;
        symbol_entry* e = symbols_.find(text(s.range));
        return e != nullptr && e->offset_unit != nullptr &&
                       e->offset_unit->scale == unit_scale::gauge
                   ? e
                   : nullptr;
    };
    symbol_entry* above = gauge(n.lhs);
    symbol_entry* below = gauge(n.rhs);
    if (above == nullptr || below == nullptr || above->offset_unit != below->offset_unit)
        return false;
    above->used = true; // read here rather than by the walk
    below->used = true;
    return true;
}

typed_term checker::eval_call(const syntax::expr_node& n) {
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
        if (square_root && (symbols_.unit_marks() & offset_scale_readings) != 0 &&
            ratio_of_gauge_readings(node)) [[unlikely]] {
            // "q = q_r*sqrt(p/p_r)": a nozzle's or a sprinkler's flow goes with the root of the
            // pressure it discharges across to the atmosphere, q = K·√p with p in psig (NFPA 13,
            // from memory): a ratio of two gauge readings on one scale is a pure number there.
            typed_term& ratio = types_.push(typed_term{});
            ratio.literal_begin = static_cast<std::uint32_t>(literals_.size());
            operands_.push_back({ratio, node});
            prefer_dimensionless_ = saved;
            square_root_argument_ = saved_root;
            continue;
        }
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
            d.notes.push_back({fmt::format("'{}' is a declared symbol; write a product with '*', "
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
            // exp(0.01875*γ_g*D/(z*T)): a number that carries the quantity the argument
            // lacks, in the units around it, makes it a pure number, as in a sum.
            if (a.type.known && a.type.literal_count != 0 && a.type.offset == nullptr &&
                !a.type.dim.is_dimensionless()) [[unlikely]]
                read_gravity_number_in_argument(args_base,
                                                static_cast<std::size_t>(&a - args.data()));
            if (a.type.known && a.type.offset != nullptr && !a.type.reading_or_difference)
                report_offset(a.node, *a.type.offset, fmt::format("the argument of {}", f->name));
            else if (reference_value_typed_in_cell_unit(*f, a)) [[unlikely]]
                continue;
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
            diagnostic& d = report(rules::argument_mismatch,
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
        if (!std::all_of(args.begin(), args.end(), [](const operand& o) { return o.type.known; }))
            return unknown_type();
        result.dim = a.reference.value_or(compact_dimension{});
        result.scale = scales_agree ? unit : std::numeric_limits<double>::quiet_NaN();
        // "max(p_v - p_b, 0)": the value is what the symbols' argument is, a gauge reading
        // from two absolute ones, not the bare number's.
        // Only where every such argument is alike: min(p_v - p_b, p_v) compares a gauge
        // reading with an absolute one and stays on the first's footing, as before.
        const auto read = std::find_if(values.begin(), values.end(),
                                       [](const operand& v) { return !v.type.numeric; });
        const bool alike =
            read != values.end() &&
            std::all_of(values.begin(), values.end(), [&](const operand& v) {
                return v.type.numeric ||
                       (v.type.absolute_pressure_difference ==
                            read->type.absolute_pressure_difference &&
                        v.type.zero_of == read->type.zero_of && v.type.point == read->type.point);
            });
        const typed_term& like = alike ? read->type : values[0].type;
        result.offset = like.offset;
        result.origin = like.origin;
        result.origin_tolerance = like.origin_tolerance;
        result.point = like.point;
        if (alike) {
            result.zero_of = like.zero_of;
            result.absolute_pressure_difference = like.absolute_pressure_difference;
            result.reading_or_difference = like.reading_or_difference;
        }
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

typed_term checker::eval_reference(const syntax::expr_node& n) const {
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
bool checker::is_bare_number(const typed_term& t) {
    return t.known && t.numeric && !t.zero && t.dim.is_dimensionless();
}

// =MAX(B2, 0.3), =IF(B2>1, B2, 0.6): a spreadsheet's numbers carry no units, so a bare
// number among values that come from cells is in their unit, as the engineer typed it, and
// only those values must agree; they are copied to `kept`. Elsewhere, and in the notation
// (where a number can be given its unit, and a bare one beside a quantity stays a
// finding), the values themselves.
std::span<const operand>
checker::with_bare_numbers_in_their_unit(std::span<const operand> values,
                                         std::vector<operand>& kept) const {
    if (file_.functions != syntax::function_names::spreadsheet)
        return values;
    const bool some_bare = std::any_of(values.begin(), values.end(),
                                       [](const operand& o) { return is_bare_number(o.type); });
    // Dimensionless values (a ratio, a count) meet a number as one: their scales are
    // weighed with it, as in the notation.
    const bool some_from_cells = std::any_of(values.begin(), values.end(), [](const operand& o) {
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
typed_term checker::eval_compare(const syntax::expr_node& n) {
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
typed_term checker::agreeing(const builtin_function& f, std::span<const operand> args,
                             std::size_t first, std::string_view others) {
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

typed_term checker::eval_sheet_call(const builtin_function& f, std::span<const operand> args) {
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

typed_term checker::derivative(std::span<const operand> args) {
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
    result.exact_scale = exact_product(args[0].type.exact_scale,
                                       plumb::exact_power(args[1].type.exact_scale, order), true);
    return result;
}

typed_term checker::integral(std::span<const operand> args) {
    // The limits answer to the variable of integration, however many of them there are.
    if (args.size() == 4 && args[1].type.known) {
        const operand* odd = nullptr;
        for (std::size_t i = 2; i < 4 && odd == nullptr; ++i)
            if (args[i].type.known && !args[i].type.zero && !(args[i].type.dim == args[1].type.dim))
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
    result.exact_scale = exact_product(args[0].type.exact_scale, args[1].type.exact_scale, false);
    return result;
}

} // namespace plumb::formula_check
