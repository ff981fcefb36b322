// Sums whose terms are readings on offset scales (°C, °F, gauge pressures): which numbers
// are scale zeros or atmospheres, and what the sum's result reads in.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// "(R_F - 32)/1.8" with R_F a range in Δ°F: a scale's zero beside a temperature difference,
// which has no zero to move. The finding stands; the note names the slip.
void checker::note_scale_zero_beside_difference(diagnostic& d, std::span<const operand> terms,
                                                const agreement& a) {
    if (!a.reference || !(*a.reference == temperature_dimension()) ||
        terms.size() > notes_for_terms_up_to)
        return;
    const operand* difference = nullptr;
    for (std::size_t i = 0; i < terms.size(); ++i) {
        const typed_term& t = terms[i].type;
        if (std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end() || !t.known || t.zero)
            continue;
        if (t.point || t.offset != nullptr || !std::isfinite(t.scale))
            return;
        difference = &terms[i];
    }
    if (difference == nullptr)
        return;
    // "1.8*ΔT + 32": the 1.8 turns the kelvins into °F degrees.
    double degree = difference->type.scale;
    for (std::uint32_t l = 0; l < difference->type.literal_count; ++l) {
        const scale_literal& n = literals_[difference->type.literal_begin + l];
        if (std::abs(n.value - 1.8) < 1e-12 && std::abs(n.exponent) == 1.0)
            degree = n.exponent > 0 ? degree / 1.8 : degree * 1.8;
    }
    struct scale_zero {
        const char* scales;
        double value;  // the zero as written, in the difference's degrees
        double degree; // the degree's size in kelvins
    };
    // 32 °F and 273.15 K for 0 °C, 459.67 °R for 0 °F (NIST SP 811 (2008), 4.2.1.1).
    static constexpr std::array<scale_zero, 3> zeros{{{"\u00B0F and \u00B0C", 32.0, 5.0 / 9.0},
                                                      {"K and \u00B0C", 273.15, 1.0},
                                                      {"\u00B0R and \u00B0F", 459.67, 5.0 / 9.0}}};
    for_each_odd_number(terms, a, [&](std::string_view written, double value) {
        for (const scale_zero& z : zeros) {
            if (std::abs(degree / z.degree - 1.0) > 1e-9 ||
                std::abs(value - z.value) > half_unit_in_last_digit(written) * (1.0 + 1e-9))
                continue;
            d.notes.push_back(
                {fmt::format("{} is the offset between the {} scales, but {} is a "
                             "temperature difference, which takes no offset: convert a "
                             "difference by the size of the degree alone ({})",
                             written, z.scales, quote(difference->node),
                             z.degree == 1.0 ? "a kelvin and a degree Celsius are the same"
                                             : "1 K = 1.8 \u0394\u00B0F"),
                 {}});
            return true;
        }
        return false;
    });
}

// "ρ*g*h + 101.325" with the column in Pa: the atmosphere was written in kPa. The finding
// stands (a bare number has no unit), but the fix is the unit, not the physics.
// "1.8*T_K + 459.67", "T_R/1.8 + 273.15": an absolute temperature converted by its factor
// to the other absolute scale, with that scale's offset zero added as well; as
// "14.5*p_abs + 14.7" is for pressures, the zero counted twice.
void checker::note_zero_added_to_converted_temperature(diagnostic& d,
                                                       std::span<const operand> terms,
                                                       const agreement& a) {
    if (terms.size() != 2 || a.odd.size() != 1)
        return;
    const operand& number = terms[a.odd.front()];
    const operand& reading = terms[1 - a.odd.front()];
    const typed_term& t = reading.type;
    if (!number.type.known || !number.type.numeric || number.type.literal_count != 1 ||
        number.subtracted || !t.known || t.offset != nullptr || t.literal_count == 0 ||
        !std::isfinite(t.scale))
        return;
    bool absolute_reading = false;
    for_each_factor(reading.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind != expr_kind::symbol || sign < 0)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        absolute_reading = e != nullptr && e->compact_dim &&
                           *e->compact_dim == temperature_dimension() &&
                           e->offset_unit == nullptr && e->reading == 1;
        return absolute_reading;
    });
    if (!absolute_reading)
        return;
    double converted = t.scale;
    for (std::uint32_t k = 0; k < t.literal_count; ++k) {
        const scale_literal& l = literals_[t.literal_begin + k];
        converted /= std::pow(l.value, l.exponent);
    }
    // Each absolute scale with the offset scale whose zero is a number in it (NIST SP 811
    // (2008), 4.2.1.1: 0 °C = 273.15 K, 0 °F = 459.67 °R).
    struct absolute_scale {
        const char* name;
        double kelvins;
        double other_zero;
        const char* other;
    };
    static constexpr std::array<absolute_scale, 2> scales{
        {{"K", 1.0, 273.15, "\u00B0C"}, {"\u00B0R", 5.0 / 9.0, 459.67, "\u00B0F"}}};
    const double value = literals_[number.type.literal_begin].value;
    for (const absolute_scale& sc : scales) {
        if (std::abs(converted / sc.kelvins - 1.0) > 0.005 ||
            std::abs(value / sc.other_zero - 1.0) > 3e-4)
            continue;
        d.rule = std::string(rules::offset_scale);
        d.message =
            fmt::format("{} is the zero of the {} scale in {}, added to {}, an "
                        "absolute temperature converted to {} already: the sum "
                        "counts that zero twice",
                        quote(number.node), sc.other, sc.name, quote(reading.node), sc.name);
        d.notes.push_back({fmt::format("drop the {}; it belongs only to a reading in {}",
                                       display_text(file_.nodes[number.node].range), sc.other),
                           {}});
        return;
    }
}

// A product with an absolute pressure reading among its factors ("14.5*p_abs").
bool checker::holds_absolute_pressure(std::uint32_t term) const {
    return for_each_factor(term, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        // A cell in an absolute unit holds a reading unless its row says otherwise.
        if (n.kind == expr_kind::reference && sign > 0) {
            const syntax::reference_value& r = file_.references[n.lhs];
            return r.dim && r.offset == nullptr && !r.difference &&
                   compact_dimension::fitted(*r.dim) == std::optional(pressure_dimension());
        }
        if (n.kind != expr_kind::symbol || sign < 0)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        return e != nullptr && e->compact_dim && *e->compact_dim == pressure_dimension() &&
               e->offset_unit == nullptr && e->reading == 1;
    });
}

// Whether a term is a vacuum reading (a factor whose name or description says "vacuum"),
// which counts down from the atmosphere rather than up from vacuum.
bool checker::names_a_vacuum(std::uint32_t node) const {
    return for_each_factor(syntax::inside_brackets(file_, node), [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (sign > 0 && n.kind == expr_kind::reference)
            return file_.references[n.lhs].vacuum;
        if (sign < 0 || n.kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(n.range);
        const symbol_entry* e = symbols_.find(name);
        return e != nullptr && (name.find("vac") != std::string_view::npos ||
                                e->description.find("vacuum") != std::string_view::npos);
    });
}

void checker::note_atmosphere_in_another_unit(diagnostic& d, std::span<const operand> terms,
                                              const agreement& a) {
    if (!a.reference || !(*a.reference == pressure_dimension()) ||
        terms.size() > notes_for_terms_up_to)
        return;
    double others = 0.0;    // the scale the other pressures share
    double converted = 0.0; // and as their conversion factors make it
    bool readings = true;   // each other term holds an absolute reading
    for (std::size_t i = 0; i < terms.size(); ++i) {
        const typed_term& t = terms[i].type;
        if (!t.known || t.zero || std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end())
            continue;
        if (!(t.dim == pressure_dimension()) || t.offset != nullptr || !std::isfinite(t.scale) ||
            (others != 0.0 && t.scale != others))
            return;
        others = t.scale;
        double scale = t.scale;
        for (std::uint32_t k = 0; k < t.literal_count; ++k) {
            const scale_literal& l = literals_[t.literal_begin + k];
            scale /= std::pow(l.value, l.exponent);
        }
        converted = scale;
        readings = readings && t.literal_count > 0 && holds_absolute_pressure(terms[i].node);
    }
    const auto named = [](double scale, double within = 1e-6) -> const pressure_unit* {
        for (const auto& u : pressure_units)
            if (std::abs(scale / u.pascals - 1.0) < within)
                return &u;
        return nullptr;
    };
    const pressure_unit* theirs = named(others);
    if (theirs == nullptr)
        return;
    // "14.5*p_abs + 14.7", "p_2/6.895 + 14.7": the reading converted by its factor is in
    // the atmosphere's unit already, and absolute; the atmosphere is the slip, not its unit.
    // Its numbers as rounded conversions (14.5 psi per bar is 14.5038).
    const pressure_unit* as_converted = readings ? named(converted, 0.005) : nullptr;
    // "14.5*p_a + 13.78" beside a barometer of 0.950 bar: the site's atmosphere in psi.
    const site_barometer* site = as_converted != nullptr ? declared_site_barometer() : nullptr;
    for_each_odd_number(terms, a, [&](std::string_view written, double value) {
        const bool site_atmosphere =
            site != nullptr && as_converted != theirs &&
            std::abs(value * as_converted->pascals / site->pascals - 1.0) <= site_barometer_slack;
        if (as_converted != nullptr && as_converted != theirs &&
            (site_atmosphere || read_reference_state(pressure_dimension(), value, written,
                                                     as_converted->pascals) != nullptr)) {
            const std::string other = terms.size() == 2
                                          ? quote(terms[a.odd.front() == 0 ? 1 : 0].node)
                                          : std::string("the other term");
            // "p_abs = 101.325 - 3.386*v_op", v_op a vacuum in inHg: a vacuum counts down from
            // the atmosphere, so the number is the atmosphere it counts from (common practice).
            // Wrong only where the file declares another one for the site.
            if (const operand* vacuum =
                    terms.size() == 2 ? &terms[a.odd.front() == 0 ? 1 : 0] : nullptr;
                vacuum != nullptr && vacuum->subtracted && !terms[a.odd.front()].subtracted &&
                names_a_vacuum(vacuum->node)) {
                for (term& t : d.terms)
                    if (t.differs && t.text == written && t.dim.is_dimensionless()) {
                        t.dim = pressure_dimension().expand();
                        t.differs = false;
                    }
                d.rule = std::string(rules::offset_scale);
                if (site_atmosphere || site == nullptr) {
                    d.level = severity::note;
                    d.rule = std::string(rules::trade_constant);
                    d.message = fmt::format("{} is read as the atmosphere in {} that the vacuum "
                                            "{} counts down from: their difference is absolute",
                                            written, as_converted->name, other);
                    return true;
                }
                d.message = fmt::format("{} is the atmosphere at sea level in {}, but the file "
                                        "declares the site's barometer '{}': the vacuum {} "
                                        "counts down from the site's atmosphere",
                                        written, as_converted->name, site->name, other);
                d.notes.push_back({fmt::format("write '{}' in place of {}, in {}", site->name,
                                               written, as_converted->name),
                                   {}});
                return true;
            }
            // The zero, not the dimension, is the finding, as for "p_psia + 14.7".
            d.rule = std::string(rules::offset_scale);
            d.message =
                site_atmosphere
                    ? fmt::format("{} is the site's barometer '{}' in {}, added to {}, an "
                                  "absolute pressure already: the sum counts the atmosphere "
                                  "twice",
                                  written, site->name, as_converted->name, other)
                    : fmt::format("{} is the atmosphere in {}, added to {}, an absolute "
                                  "pressure already: the sum counts that zero twice",
                                  written, as_converted->name, other);
            // The number is read as a pressure, not as a dimensionless term that differs.
            for (term& t : d.terms)
                if (t.differs && t.text == written && t.dim.is_dimensionless()) {
                    t.dim = pressure_dimension().expand();
                    t.differs = false;
                }
            d.notes.push_back({fmt::format("{} is an absolute pressure converted to {} by its "
                                           "factor; drop the {}, or convert a gauge reading",
                                           other, as_converted->name, written),
                               {}});
            return true;
        }
        for (const auto& u : pressure_units) {
            if (&u == theirs ||
                read_reference_state(pressure_dimension(), value, written, u.pascals) == nullptr)
                continue;
            // The standard atmosphere where it is one, rather than 14.7 psi's 101.353 kPa.
            double pascals = value * u.pascals;
            if (std::abs(pascals / standard_atmosphere - 1.0) < 0.005)
                pascals = standard_atmosphere;
            const std::string others_named =
                terms.size() == 2 ? quote(terms[a.odd.front() == 0 ? 1 : 0].node) + " is"
                                  : std::string("the other terms are");
            d.notes.push_back(
                {fmt::format("{} reads as the atmosphere in {}, but {} in {}: write it as "
                             "{:.6g} {}, or convert to {} first",
                             written, u.name, others_named, theirs->name, pascals / others,
                             theirs->name, u.name),
                 {}});
            return true;
        }
        return false;
    });
}

// "20.9 - O2" with O2 in %, "θ + 90" with θ in degrees: in a sum whose other terms are all
// in one scaled dimensionless unit, a bare number is a value in that unit, as engineers
// mean it. Where the terms are plain fractions ("1 - S/100") the number stays one too.
// In a limit (`bounds`), no number up to 1: "RH <= 0.6" beside RH in % is a fraction's bound
// as often as a percentage's, and the finding asks which.
void checker::adopt_numbers_in_scaled_unit(std::size_t base, bool bounds) {
    double unit = std::numeric_limits<double>::quiet_NaN();
    bool numbers = false;
    for (std::size_t i = base; i < operands_.size(); ++i) {
        const typed_term& t = operands_[i].type;
        if (!t.known || t.zero)
            continue;
        if (t.numeric) {
            numbers = true;
            continue;
        }
        const double u = unit_as_written(t);
        if (!std::isfinite(u))
            return;
        if (!std::isfinite(unit))
            unit = u;
        else if (std::abs(u / unit - 1.0) > 1e-9)
            return; // terms in different units: the scale rule speaks
    }
    if (!numbers || !std::isfinite(unit) || std::abs(unit - 1.0) <= 1e-9)
        return;
    // Only where the scale is a unit numbers are written in (%, °, ppm): in "f*L/d_mm + 4"
    // the 1000 of L in m over d in mm is no unit the 4 is in.
    // Nor where the term converts out of it: "θ_deg*pi/180 + 0.005" is in radians.
    for (std::size_t i = base; i < operands_.size(); ++i) {
        const typed_term& t = operands_[i].type;
        if (t.known && !t.zero && !t.numeric &&
            (!holds_scaled_ratio_unit(operands_[i].node) ||
             (t.literal_count > 0 && holds_pi(operands_[i].node))))
            return;
    }
    // A number's type is shared only with numbers equal to it, which change alike.
    // But not 1: "1 - L" with L in % is the complement of a fraction written beside a
    // percentage, the slip, far more often than 1 % less L.
    for (std::size_t i = base; i < operands_.size(); ++i) {
        auto& t = const_cast<typed_term&>(operands_[i].type);
        if (t.known && !t.zero && t.numeric && !(t.value && *t.value == rational(1)) &&
            !(bounds && t.value && !(rational(1) < *t.value)))
            t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
    }
}

// "=(C22 + C37 + 50 + 75)/1000" with the cells in mm: a spreadsheet's numbers carry no
// units, so an allowance typed into a sum of cells of one unit is in that unit, as the
// engineer means it. Not beside pressures and temperatures, where a number is a zero or
// the atmosphere and the rules for those read it.
void checker::adopt_numbers_beside_cells(std::size_t base) {
    const typed_term* unit = nullptr;
    bool numbers = false;
    for (std::size_t i = base; i < operands_.size(); ++i) {
        const typed_term& t = operands_[i].type;
        if (!t.known || t.zero)
            continue;
        if (t.numeric) {
            numbers = numbers || t.dim.is_dimensionless();
            continue;
        }
        if (t.offset != nullptr || t.dim.is_dimensionless() || t.dim == pressure_dimension() ||
            t.dim == temperature_dimension() ||
            (unit != nullptr && !(t.dim == unit->dim && t.scale == unit->scale)))
            return;
        unit = &t;
    }
    if (!numbers || unit == nullptr)
        return;
    // "=9.81*C21 + 101.325": a term with a number that may be a quantity's (a column's
    // pressure), beside the atmosphere, is for the sum's rules to read.
    if (unit->literal_count > 0 && atmosphere_among_numbers(base)) [[unlikely]]
        return;
    const compact_dimension dim = unit->dim;
    for (std::size_t i = base; i < operands_.size(); ++i) {
        auto& t = const_cast<typed_term&>(operands_[i].type);
        if (t.known && !t.zero && t.numeric && t.dim.is_dimensionless()) {
            t.dim = dim;
            t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
        }
    }
}

// Whether a bare number among the sum's terms is the standard atmosphere in one of the
// trades' pressure units (101.325, 14.7, 1.01325).
bool checker::atmosphere_among_numbers(std::size_t base) const {
    for (std::size_t i = base; i < operands_.size(); ++i) {
        const typed_term& t = operands_[i].type;
        if (!t.known || !t.numeric || t.literal_count != 1)
            continue;
        const scale_literal& l = literals_[t.literal_begin];
        const std::string_view written = text(file_.nodes[l.node].range);
        for (const auto& u : pressure_units)
            if (read_reference_state(pressure_dimension(), l.value, written, u.pascals) != nullptr)
                return true;
    }
    return false;
}

// In a sum with a value on an offset scale, a bare number is a value in that unit
// ("T_F = 1.8*T_C + 32"). Returns the first such value, or null.
const typed_term* checker::adopt_numbers_on_offset_scale(std::size_t base) {
    const typed_term* offset_term = nullptr;
    for (std::size_t i = base; i < operands_.size() && offset_term == nullptr; ++i)
        if (operands_[i].type.known && operands_[i].type.offset != nullptr)
            offset_term = &operands_[i].type;
    // A reading on an absolute scale may be shifted onto an offset one (T_K - 273.15).
    for (std::size_t i = base; i < operands_.size() && offset_term == nullptr; ++i)
        if (operands_[i].type.known && operands_[i].type.point &&
            operands_[i].type.literal_count == 0)
            offset_term = &operands_[i].type;
    // "p_s/6.895 - 14.696" into psig, "T_K*1.8 - 459.67" into °F: an absolute reading
    // converted by its factor, less a number, is shifted onto an offset scale in the unit the
    // factor gives, as p_psia - 14.696 is. Only a number taken off: one added to a converted
    // absolute reading counts the zero twice, which the sum's own finding says.
    if (offset_term == nullptr && operands_.size() - base == 2) {
        const operand& reading = operands_[base];
        const operand& number = operands_[base + 1];
        if (reading.type.known && reading.type.point && !reading.subtracted &&
            reading.type.literal_count != 0 && number.subtracted && number.type.numeric &&
            number.type.value && number.type.literal_count == 1 &&
            converts_to_a_named_unit(reading.type))
            offset_term = &reading.type;
    }
    if (offset_term == nullptr)
        return nullptr;
    for (std::size_t i = base; i < operands_.size(); ++i) {
        // Shared only among operands of one type, which all change alike.
        auto& t = const_cast<typed_term&>(operands_[i].type);
        if (t.numeric && t.value && !t.zero && t.dim.is_dimensionless()) {
            t.dim = offset_term->dim;
            t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
            t.exact_scale.reset();
        }
    }
    return offset_term;
}

// Whether a reading's numbers, taken as conversions, give a pressure unit the trades read
// gauges in (psi, kPa, bar, ...) or an absolute temperature scale (K, °R): "6.895*p_kPa" gives
// none, for the factor runs the wrong way.
bool checker::converts_to_a_named_unit(const typed_term& t) const {
    if (!std::isfinite(t.scale))
        return false;
    double converted = t.scale;
    for (std::uint32_t k = 0; k < t.literal_count; ++k) {
        const scale_literal& l = literals_[t.literal_begin + k];
        converted /= std::pow(l.value, l.exponent);
    }
    if (t.dim == temperature_dimension())
        return std::abs(converted - 1.0) < 0.005 || std::abs(converted * 1.8 - 1.0) < 0.005;
    if (!(t.dim == pressure_dimension()))
        return false;
    return std::any_of(pressure_units.begin(), pressure_units.end(), [&](const pressure_unit& u) {
        return std::abs(converted / u.pascals - 1.0) < 0.005;
    });
}

bool checker::is_shift_candidate(const operand& op) const {
    if (!op.type.known || op.type.zero)
        return false;
    if (op.type.numeric && op.type.value)
        return true;
    return file_.nodes[op.node].kind == expr_kind::quantity && op.type.offset == nullptr;
}

checker::shift checker::shift_of(const operand& op) const {
    shift s;
    const double sign = op.subtracted ? -1.0 : 1.0;
    if (op.type.numeric && op.type.value) {
        s.written = sign * op.type.value->to_double();
        // Handbooks print the atmosphere 101.35 kPa (Metcalf & Eddy's saturator pressure,
        // from memory) as well as 101.3 and 101.325: a zero is read within 0.03 % of its
        // value whatever the digits. The scales' zeros lie far further apart than that.
        s.tolerance = std::max(
            op.type.literal_count == 1 ? literals_[op.type.literal_begin].tolerance : 1e-9, 3e-4);
        return s;
    }
    const syntax::expr_node& n = file_.nodes[op.node];
    const syntax::quantity_literal& q = file_.quantities[n.lhs];
    s.si = sign * quantity_si_value(n);
    const std::string_view t = text(n.range);
    const std::string_view number = t.substr(0, t.find_first_of(" \t{"));
    s.tolerance = q.constant || number.empty()
                      ? 1e-9
                      : read_literal(number, std::abs(s.si) / q.si_factor, 0).tolerance;
    return s;
}

// Where a scale of this dimension can have its zero: absolute, or an offset unit's zero.
bool checker::recognised_origin(double origin, double tolerance, const compact_dimension& dim,
                                std::span<const operand> terms) const {
    const double slack = tolerance + 1e-9 * std::abs(origin) + 1e-9;
    if (std::abs(origin) <= slack)
        return true;
    for (const auto& t : terms)
        if (t.type.offset != nullptr && std::abs(t.type.offset->offset - origin) <= slack)
            return true;
    for (const auto& row : offset_rows())
        if (row.dim == dim && std::abs(row.unit->offset - origin) <= slack)
            return true;
    return false;
}

// "(T_ho - t_ci - 32)/1.8", "(p_1g - p_2g) + 14.7": a scale's zero, or the step between
// two scales' zeros, added to a difference of readings, which has no zero to move. The
// reading conversion applied to a difference; a difference converts by the factor alone.
bool checker::report_zero_beside_difference_of_readings(std::span<const operand> terms, double unit,
                                                        const compact_dimension& dim) {
    bool readings = false;
    for (const auto& t : terms)
        readings = readings || (t.type.known && t.type.point && !is_shift_candidate(t));
    if (!readings || !(unit > 0) || !std::isfinite(unit))
        return false;
    for (const auto& t : terms) {
        if (!is_shift_candidate(t))
            continue;
        const shift sh = shift_of(t);
        const double si = std::abs(sh.si + sh.written * unit);
        const double slack = si * sh.tolerance + 1e-9 * si;
        if (!(si > 0))
            continue;
        const auto& rows = offset_rows();
        for (std::size_t a = 0; a < rows.size(); ++a) {
            if (!(rows[a].dim == dim))
                continue;
            for (std::size_t b = a; b < rows.size(); ++b) {
                if (!(rows[b].dim == dim))
                    continue;
                // A zero itself (b == a), or the step between two zeros.
                const double step = b == a ? rows[a].unit->offset
                                           : std::abs(rows[a].unit->offset - rows[b].unit->offset);
                if (!(step > 0) || std::abs(si - step) > slack)
                    continue;
                diagnostic& d = report(
                    rules::offset_scale,
                    fmt::format("{} is {} but is added to a difference of readings, which "
                                "has no zero to move",
                                display_text(file_.nodes[t.node].range),
                                b == a
                                    ? fmt::format("the zero of the {} scale", rows[a].unit->symbol)
                                    : fmt::format("the step between the zeros of the {} "
                                                  "and {} scales",
                                                  rows[a].unit->symbol, rows[b].unit->symbol)),
                    file_.nodes[t.node].range);
                add_term(d, t);
                d.notes.push_back({"a difference of two readings converts by the factor "
                                   "between the units alone (a °F difference / 1.8 is a K "
                                   "difference); only a single reading needs the zero",
                                   {}});
                return true;
            }
        }
    }
    return false;
}

// The table's (or the formula's) offset unit whose zero is `origin`, to name the scale.
const unit_definition* checker::scale_named(double origin, double tolerance,
                                            const compact_dimension& dim,
                                            std::span<const operand> terms) const {
    const double slack = tolerance + 1e-9 * std::abs(origin) + 1e-9;
    for (const auto& t : terms)
        if (t.type.offset != nullptr && std::abs(t.type.offset->offset - origin) <= slack)
            return t.type.offset;
    // A zero known to no bound names no scale of the table: any would match.
    if (std::isfinite(slack))
        for (const auto& row : offset_rows())
            if (row.dim == dim && std::abs(row.unit->offset - origin) <= slack)
                return row.unit;
    for (const auto& t : terms)
        if (t.type.offset != nullptr)
            return t.type.offset;
    return nullptr;
}

// Whether an absolute pressure among the sum's plain terms is in the unit `scale` (SI per
// written value), the unit a gauge term's divisor takes it into.
bool checker::gauge_divided_into_absolute_unit(std::span<const operand> terms, double scale) {
    return std::any_of(terms.begin(), terms.end(), [&](const operand& o) {
        return o.type.known && o.type.point && o.type.offset == nullptr &&
               o.type.dim == pressure_dimension() && o.type.literal_count == 0 &&
               std::abs(o.type.scale / scale - 1.0) < 1e-9;
    });
}

// "ρ*g*h", "γ*H", "0.433*SG*h": a liquid's or a fill's column, a density (with g) or a unit
// weight times one height, and numbers.
bool checker::column_pressure(std::uint32_t node) const {
    int lengths = 0;
    int densities = 0;
    int weights = 0;
    int gravities = 0;
    const bool other = for_each_factor(node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number)
            return false;
        if (n.kind == expr_kind::quantity) {
            gravities += file_.quantities[n.lhs].constant ? 1 : 0;
            return !file_.quantities[n.lhs].constant;
        }
        if (n.kind != expr_kind::symbol || sign < 0)
            return true;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || !e->compact_dim)
            return true;
        const compact_dimension& dim = *e->compact_dim;
        lengths += dim == length_dim ? 1 : 0;
        densities += dim == density_dim ? 1 : 0;
        weights += dim == pressure_gradient_dim ? 1 : 0;
        gravities += dim == acceleration_dimension() ? 1 : 0;
        return !(dim == length_dim || dim == density_dim || dim == pressure_gradient_dim ||
                 dim == acceleration_dimension() || dim.is_dimensionless());
    });
    return !other && lengths == 1 && densities + weights == 1 && gravities <= 1;
}

// "p_in = p_b + 0.2491*p_vac": a vacuum counts down from the barometer, so added to it the sum
// stands as far above the atmosphere as the inlet is below it (common practice: absolute =
// barometric - vacuum). Asked of a sum of two added pressures, one the atmosphere by its name.
bool checker::report_vacuum_added_to_barometer(std::span<const operand> terms) {
    if (terms.size() != 2 || terms[0].subtracted || terms[1].subtracted)
        return false;
    for (std::size_t i = 0; i < 2; ++i) {
        const operand& atmosphere = terms[i];
        const operand& vacuum = terms[1 - i];
        // A gauge reading under a vacuum is negative, and the barometer added to it is right
        // ("p_abs = p_vg + p_b" with p_vg at -69 kPa g).
        if (!atmosphere.type.known || !vacuum.type.known || vacuum.type.offset != nullptr ||
            !(atmosphere.type.dim == pressure_dimension()) ||
            !(vacuum.type.dim == pressure_dimension()) || !names_atmosphere(atmosphere.node) ||
            names_atmosphere(vacuum.node) || !names_a_vacuum(vacuum.node))
            continue;
        diagnostic& d =
            report(rules::offset_scale,
                   fmt::format("{} is a vacuum, which counts down from the barometer {}: added "
                               "to it, the sum stands as far above the atmosphere as the "
                               "pressure is below it",
                               quote(vacuum.node), quote(atmosphere.node)),
                   file_.nodes[vacuum.node].range);
        d.level = severity::warning;
        d.notes.push_back({fmt::format("an absolute pressure under a vacuum is the barometer "
                                       "less the vacuum: write ({} - {})",
                                       display_text(file_.nodes[atmosphere.node].range),
                                       display_text(file_.nodes[vacuum.node].range)),
                           {}});
        return true;
    }
    return false;
}

typed_term checker::finish_offset_sum(std::span<const operand> terms, typed_term result,
                                      std::size_t literal_base, std::uint32_t index) {
    if (terms.size() == 2 && result.known && result.dim == pressure_dimension()) [[unlikely]]
        report_vacuum_added_to_barometer(terms);
    // The terms with units (not the numbers that shift the zero).
    std::size_t unit_terms = 0;
    std::size_t only = 0;
    for (std::size_t i = 0; i < terms.size(); ++i)
        if (terms[i].type.known && !terms[i].type.zero && !is_shift_candidate(terms[i])) {
            ++unit_terms;
            only = i;
        }
    // Zeros of the values on a scale, signed, and the absolute pressures added to gauge ones.
    double origin = 0.0;
    double origin_tolerance = 0.0;
    int points = 0;
    int gauges = 0;
    int gauges_subtracted = 0;
    double subtracted_gauge_zero = 0.0;
    int absolute_pressures_added = 0;
    int absolute_pressures_subtracted = 0;
    int offset_temperatures = 0;
    int kelvins_added = 0;
    double gauge_zero = 0.0;
    // The same with each reading's weight (T_1/2 + T_2/2 is one reading, T_s + T_a/2 is
    // not), where every weight is followed.
    std::optional<rational> weight = rational(0);
    double weighted_origin = 0.0;
    // The weights of the gauge readings added: 11/10 in "1.1*p_set + p_b".
    std::optional<rational> gauge_weight = rational(0);
    for (const auto& t : terms) {
        if (!t.type.known || t.type.zero || is_shift_candidate(t) || !t.type.point)
            continue;
        const double sign = t.subtracted ? -1.0 : 1.0;
        // "c + (γ*z - u)": a group that subtracts a reading counts as one subtracted.
        const bool negative = t.type.weight_denominator != 0 && t.type.weight_numerator < 0;
        origin += (negative ? -sign : sign) * t.type.origin;
        origin_tolerance += reading_tolerance(t.type);
        points += (t.subtracted != negative) ? -1 : 1;
        // A mean's weights are small fractions (1/2, 1/3, 3/5); a larger number beside a
        // reading (100*p_bar to kPa, 6.895*p_psig) converts it, and is no weight.
        std::optional<rational> w = weight_of(t.type);
        if (w && (std::abs(w->num()) > 12 || w->den() > 12))
            w.reset();
        // "(t_1 + t_2)/2*1.8 + 32": a mean of °C readings taken to °F weighs 9/5, the degree's
        // ratio (NIST SP 811 (2008), B.8), which converts one reading and weighs nothing.
        if (w && ((std::abs(w->num()) == 9 && w->den() == 5) ||
                  (std::abs(w->num()) == 5 && w->den() == 9)))
            w = rational(w->num() < 0 ? -1 : 1);
        // "p_b + p_sup/10" with p_sup in mbar g and p_b in kPa: the 10 takes the gauge
        // reading into the barometer's unit, and weighs nothing; "p_b + p_g/10" with both
        // in kPa weighs a tenth of the reading.
        if (w && w->num() == 1 && w->den() > 1 && t.type.offset != nullptr &&
            t.type.offset->scale == unit_scale::gauge &&
            gauge_divided_into_absolute_unit(terms, t.type.scale * w->den())) [[unlikely]]
            w = rational(1);
        // "p_n - 0.1*p_bh" with the reading in kPa and the barometer in hPa, "10*p_n - p_bh":
        // a power of ten that takes one absolute reading into another's unit converts it.
        if (w && t.type.point && t.type.offset == nullptr && w->num() > 0 &&
            (w->num() == 1 || w->den() == 1) && w->num() * w->den() > 1 &&
            (w->num() * w->den()) % 10 == 0 &&
            std::any_of(terms.begin(), terms.end(), [&](const operand& o) {
                return &o != &t && o.type.known && o.type.point && o.type.offset == nullptr &&
                       o.type.dim == t.type.dim && o.type.literal_count == 0 &&
                       std::abs(o.type.scale * w->to_double() / t.type.scale - 1.0) < 1e-9;
            })) [[unlikely]]
            w = rational(1);
        if (weight && w && std::isfinite(t.type.origin_tolerance)) {
            try {
                weight = t.subtracted ? *weight - *w : *weight + *w;
                weighted_origin += sign * w->to_double() * t.type.origin;
            } catch (const std::exception&) {
                weight.reset();
            }
        } else {
            weight.reset();
        }
        if (t.type.offset != nullptr && t.type.offset->scale == unit_scale::gauge &&
            !t.subtracted) {
            ++gauges;
            gauge_zero = t.type.offset->offset;
            if (negative) { // "-p_suc + ρ*g*h": added, but negated
                ++gauges_subtracted;
                subtracted_gauge_zero = gauge_zero;
            }
            try {
                gauge_weight = gauge_weight && w ? std::optional(*gauge_weight + *w) : std::nullopt;
            } catch (const std::exception&) {
                gauge_weight.reset();
            }
        } else if (t.type.offset != nullptr && t.type.offset->scale == unit_scale::gauge &&
                   !negative) {
            ++gauges_subtracted;
            subtracted_gauge_zero = t.type.offset->offset;
        } else if (t.type.offset == nullptr && t.type.dim == pressure_dimension() &&
                   !t.subtracted) {
            ++absolute_pressures_added;
        } else if (t.type.offset == nullptr && t.type.dim == pressure_dimension() && !negative) {
            ++absolute_pressures_subtracted;
        } else if (t.type.offset != nullptr && t.type.dim == temperature_dimension() &&
                   !t.subtracted) {
            ++offset_temperatures;
        } else if (t.type.offset == nullptr && t.type.dim == temperature_dimension() &&
                   !t.subtracted) {
            ++kelvins_added;
        }
    }
    // "t_j = t_v + BPE" with BPE in K: a temperature on an absolute scale added to a °C
    // reading is a difference (the SI Brochure, 2.3.1, gives differences in K); two
    // readings added make no temperature. (T_K - T_C, the ice point, subtracts the °C one.)
    if (offset_temperatures > 0 && kelvins_added > 0) {
        points -= kelvins_added;
        if (weight)
            weight = *weight - rational(kelvins_added);
    }
    // "p_g + p_atm": an absolute pressure added to a gauge reading supplies its zero, and
    // any further ones ("p_g + p_atm + p_fric") are drops: one atmosphere at most. Where a
    // number is added too ("p_g + p_fric + p_static + 14.7"), the number is the
    // atmosphere and every absolute pressure added is a drop.
    bool number_added = false;
    bool number_subtracted = false;
    for (const auto& t : terms)
        if (is_shift_candidate(t))
            (t.subtracted ? number_subtracted : number_added) = true;
    if (gauges > 0 && absolute_pressures_added > 0) {
        if (!number_added) {
            origin -= gauge_zero;
            weighted_origin -= gauge_zero;
        }
        // The gauge reading and the atmosphere make one reading; drops are no readings.
        points -= absolute_pressures_added;
        if (weight)
            weight = *weight - rational(absolute_pressures_added);
        // "1.1*p_set + p_b": a set pressure's allowance (10 % over it, 21 % in a fire; API
        // 520 Part I, from memory) is taken of the gauge reading and the atmosphere added
        // after it, as with "1.1*p_set + 14.7". Only an allowance over 1 and up to 3/2:
        // "0.9*p_g + p_atm" is a gas's precharge, whose ratio takes the atmosphere inside.
        if (weight && gauge_weight && rational(1) < *gauge_weight &&
            !(rational(3, 2) < *gauge_weight))
            weight = *weight - *gauge_weight + rational(1);
    }
    // "ρ*g*h/1000 - p_suc": a column's pressure is what a gauge at its foot reads, so a gauge
    // reading taken from it leaves a difference (a membrane's transmembrane pressure; a
    // preload's fill less the vacuum gauge's negative reading), as "-p_suc + ρ*g*h" is.
    if (weight && *weight == rational(-1) && points == -1 && gauges <= 1 &&
        gauges_subtracted == 1 && absolute_pressures_added == 0 &&
        std::none_of(terms.begin(), terms.end(),
                     [&](const operand& t) { return is_shift_candidate(t); }) &&
        std::any_of(terms.begin(), terms.end(), [&](const operand& t) {
            return !t.subtracted && t.type.known && !t.type.point &&
                   t.type.dim == pressure_dimension() && column_pressure(t.node);
        })) [[unlikely]] {
        origin += subtracted_gauge_zero;
        weighted_origin += subtracted_gauge_zero;
        points = 0;
        weight = rational(0);
    }
    // "p_sat + p_air": absolute pressures added are partial pressures making one absolute
    // reading (Dalton's law), not a reading weighing two; set equal to a gauge reading its
    // zero is the finding.
    if (!number_added && !number_subtracted && gauges == 0 && points >= 2 &&
        absolute_pressures_added == points && absolute_pressures_subtracted == 0 &&
        result.dim == pressure_dimension()) {
        points = 1;
        weight = rational(1);
    }
    // The mirror: "p_bh - 14.7 - p_hyd", an absolute reading less the atmosphere written as
    // a number, is a gauge reading, and the further pressures subtracted are drops; unless
    // one of them names the atmosphere, which would then be taken off twice.
    if (gauges == 0 && number_subtracted && absolute_pressures_added == 1 &&
        absolute_pressures_subtracted > 0) [[unlikely]] {
        const bool atmosphere_subtracted =
            std::any_of(terms.begin(), terms.end(),
                        [&](const operand& t) { return t.subtracted && names_atmosphere(t.node); });
        if (atmosphere_subtracted && report_atmosphere_taken_twice(terms, only)) {
            cut_literals_to(literal_base);
            return unknown_type();
        }
        if (!number_added && !atmosphere_subtracted) {
            points += absolute_pressures_subtracted;
            if (weight)
                weight = *weight + rational(absolute_pressures_subtracted);
        }
    }
    // `unit_tolerance`: how far the unit may be off, relative, when rounded numbers
    // converted it (6.895 for 6.894757 in "6.895*p_g + 101.325").
    const auto shifted = [&](double unit, double unit_tolerance, double* tolerance) {
        double o = origin;
        double tol = origin_tolerance;
        for (const auto& t : terms)
            if (is_shift_candidate(t)) {
                const shift s = shift_of(t);
                const double si = s.si + s.written * unit;
                o -= si;
                tol += std::abs(si) * s.tolerance + std::abs(s.written * unit) * unit_tolerance;
            }
        *tolerance = tol;
        return o;
    };
    double unit_tolerance = 0.0;
    bool has_shift = false;
    for (const auto& t : terms)
        has_shift = has_shift || is_shift_candidate(t);

    double unit = terms[only].type.scale;
    bool keep_literals = false;
    bool one_bar_atmosphere = false;
    if (unit_terms == 1) {
        // "1.8*T_C + 32": the numbers that multiply the one value with a unit may convert
        // it; the choice that puts the zero where some scale has one is the conversion.
        const operand& term = terms[only];
        keep_literals = true;
        if (has_shift) {
            const std::span<const scale_literal> lits(
                literals_.data() + term.type.literal_begin,
                std::min<std::size_t>(term.type.literal_count, 8));
            // A number times one reading, with a number added ("6.895*p_g + 14.7"): the
            // added number is in the product's unit, so the multiplier must be a
            // conversion. Only a mean ((T_1 + T_2)/2 + 273.15) keeps the reading's unit.
            const bool multiplied_reading =
                !lits.empty() && std::isfinite(term.type.origin_tolerance);
            bool found = false;
            for (std::uint32_t mask = multiplied_reading ? 1 : 0; mask < (1U << lits.size());
                 ++mask) {
                double product = 1.0;
                double product_tolerance = 0.0;
                for (std::size_t k = 0; k < lits.size(); ++k)
                    if ((mask >> k) & 1U) {
                        product *= std::pow(lits[k].value, lits[k].exponent);
                        product_tolerance += lits[k].tolerance * std::abs(lits[k].exponent);
                    }
                double tol = 0.0;
                const double o = shifted(term.type.scale / product, product_tolerance, &tol);
                if (recognised_origin(o, tol, term.type.dim, terms)) {
                    unit = term.type.scale / product;
                    unit_tolerance = product_tolerance;
                    // The numbers stay with the term: where its sides meet, a rounded
                    // factor (14.5 for 14.5038) is weighed with its printed digits.
                    keep_literals = true;
                    found = true;
                    break;
                }
            }
            // "1.1*p_set + 14.7": a gauge reading scaled by an allowance (10 % over the set
            // pressure) keeps its zero at the atmosphere, so the added number is in the
            // reading's own unit. Tried only after every conversion, and only for numbers
            // near 1 that look like no conversion.
            const bool allowance_only =
                multiplied_reading && term.type.offset != nullptr &&
                term.type.offset->scale == unit_scale::gauge &&
                std::all_of(lits.begin(), lits.end(), [](const scale_literal& l) {
                    return std::abs(l.exponent) == 1.0 && l.value >= 0.5 && l.value <= 2.0 &&
                           !looks_like_conversion(l, true);
                });
            if (!found && allowance_only) {
                double tol = 0.0;
                const double o = shifted(term.type.scale, 0.0, &tol);
                if (recognised_origin(o, tol, term.type.dim, terms)) {
                    unit = term.type.scale;
                    found = true;
                }
            }
            // "(p_e + 1)/(p_e - p_0)" in bar g: EN 12828's expansion vessel takes the
            // atmosphere as 1 bar (100 kPa), 1.3 % under the standard one; only that round
            // figure, added to a gauge reading in bar or kPa inside a side (a whole side
            // set equal to an absolute pressure is read as the site's barometer instead).
            if (!found && lits.empty() && !is_whole_side(index) && term.type.offset != nullptr &&
                term.type.offset->scale == unit_scale::gauge &&
                (term.type.scale == 1e5 || term.type.scale == 1e3)) {
                bool round_atmosphere = true;
                for (const auto& t : terms)
                    if (is_shift_candidate(t))
                        round_atmosphere = round_atmosphere && t.type.numeric && !t.subtracted &&
                                           shift_of(t).written * term.type.scale == 1e5;
                double tol = 0.0;
                one_bar_atmosphere =
                    round_atmosphere &&
                    std::abs(shifted(term.type.scale, 0.0, &tol)) <= 0.014 * standard_atmosphere;
            }
            if (multiplied_reading && !found) {
                // No conversion lands the zero: read every number as one, so that the sum
                // is the reading moved by a difference and its zero is compared as such.
                double product = 1.0;
                for (const auto& l : lits) {
                    product *= std::pow(l.value, l.exponent);
                    unit_tolerance += l.tolerance * std::abs(l.exponent);
                }
                unit = term.type.scale / product;
            }
        }
    } else if (!(has_shift && converted_alike(terms, shifted, result.dim, unit))) {
        // Where every term has a unit (p_2 + ρ*g*Δz, T_1 - T_2), they are the terms
        // themselves, in order: no list to allocate.
        std::vector<operand> unit_operands;
        if (unit_terms != terms.size())
            for (const auto& t : terms)
                if (t.type.known && !t.type.zero && !is_shift_candidate(t))
                    unit_operands.push_back(t);
        if (!check_scales(unit_terms == terms.size() ? terms
                                                     : std::span<const operand>(unit_operands),
                          "terms of this sum", unit)) {
            cut_literals_to(literal_base);
            return unknown_type();
        }
    }
    double tolerance = origin_tolerance;
    double final_origin = origin;
    bool shifted_to_a_zero = false;
    if (has_shift) {
        double tol = 0.0;
        const double o = shifted(unit, unit_tolerance, &tol);
        // A number that does not land the zero on a scale is a difference (T + 5).
        if (recognised_origin(o, tol, result.dim, terms)) {
            final_origin = o;
            tolerance = tol;
            shifted_to_a_zero = true;
        } else if (one_bar_atmosphere) {
            final_origin = 0.0;
            tolerance = std::abs(o);
            shifted_to_a_zero = true;
        } else if (gauges > 0 &&
                   (unit_terms >= 2 ||
                    (terms[only].type.literal_count == 0 && !is_whole_side(index))) &&
                   read_site_atmosphere_in_sum(terms, unit, o, tol)) [[unlikely]] {
            final_origin = 0.0;
            tolerance = std::abs(o) + tol;
            shifted_to_a_zero = true;
        }
    }
    // "p_psig = p_d/6.895 + 14.696": set equal to a gauge reading, the atmosphere added is
    // the slip, which the sides' finding names; which atmosphere it was is beside the point.
    const bool side_on_gauge = sum_side_hint_ != nullptr && sum_side_hint_->known &&
                               sum_side_hint_->offset != nullptr &&
                               sum_side_hint_->offset->scale == unit_scale::gauge;
    if (shifted_to_a_zero && gauges > 0 && std::abs(final_origin) <= tolerance + 1e-9 &&
        !side_on_gauge)
        warn_sea_level_atmosphere_at_site(terms, unit);
    else if (has_shift && gauges == 0 && result.known && result.dim == pressure_dimension())
        [[unlikely]]
        warn_atmosphere_number_at_site(terms, unit);
    if (has_shift && !shifted_to_a_zero && points == 0 && unit_terms >= 2 &&
        report_zero_beside_difference_of_readings(terms, unit, result.dim)) {
        cut_literals_to(literal_base);
        return unknown_type();
    }
    if (has_shift && !shifted_to_a_zero && points == 1 && std::abs(origin) <= 1e-9 &&
        report_zero_added_twice(terms, unit, result.dim)) {
        cut_literals_to(literal_base);
        return unknown_type();
    }
    // "(10 - T_w)": a reference less a reading, the difference the other way round.
    if (has_shift && !shifted_to_a_zero && points == -1 &&
        std::any_of(terms.begin(), terms.end(),
                    [&](const operand& t) { return is_shift_candidate(t) && !t.subtracted; }))
        result.reading_or_difference = true;
    if (has_shift && !shifted_to_a_zero && points == 1) {
        for (const auto& t : terms) {
            if (!is_shift_candidate(t) || !t.subtracted)
                continue;
            const shift sh = shift_of(t);
            const double si = std::abs(sh.si + sh.written * unit);
            // "T_C - 273.15": the conversion, with the wrong sign.
            if (origin > 0 && std::abs(si - origin) <= si * sh.tolerance + 1e-9 * origin) {
                const unit_definition* named = scale_named(origin, 0.0, result.dim, terms);
                diagnostic& d = report(
                    rules::offset_scale,
                    fmt::format("{} is subtracted from a reading on the {} scale: that moves "
                                "its zero twice as far, it does not convert it",
                                display_text(file_.nodes[t.node].range),
                                named != nullptr ? named->symbol : "offset"),
                    file_.nodes[t.node].range);
                add_term(d, t);
                d.notes.push_back({fmt::format("to convert to the absolute scale, add it: "
                                               "(... + {})",
                                               display_text(file_.nodes[t.node].range)),
                                   {}});
                cut_literals_to(literal_base);
                return unknown_type();
            }
            // "(T_w - 140 {K})" with T_w in °C, the Vogel fit of water's viscosity: a number
            // typed in kelvins, not on the reading's scale, is an absolute temperature, and the
            // fit takes the reading in kelvins too. It stays a reading, which a factor may not
            // be; "(T - 20)" and "(T - 20 {°C})" are the difference from a reference reading.
            const syntax::expr_node& number = file_.nodes[syntax::inside_brackets(file_, t.node)];
            const bool on_offset_scale =
                std::any_of(terms.begin(), terms.end(), [](const operand& o) {
                    return o.type.known && o.type.point && o.type.offset != nullptr;
                });
            if (number.kind == expr_kind::quantity && on_offset_scale &&
                result.dim == temperature_dimension()) {
                const syntax::quantity_literal& q = file_.quantities[number.lhs];
                if (q.single_unit != nullptr && q.single_unit->offset == 0.0 &&
                    !q.single_unit->symbol.starts_with("\u0394"))
                    continue;
            }
            // "(T - 20)": the difference from a reference reading, where a factor.
            result.reading_or_difference = true;
        }
    }
    if (keep_literals) {
        // Pass the one term's numbers on: the conversion may be decided further up.
        const operand& term = terms[only];
        std::copy(literals_.begin() + term.type.literal_begin,
                  literals_.begin() + term.type.literal_begin + term.type.literal_count,
                  literals_.begin() + static_cast<std::ptrdiff_t>(literal_base));
        cut_literals_to(literal_base + term.type.literal_count);
        unit = terms[only].type.scale;
    } else {
        // "p_a = p_psig/14.5 + p_b/1000" into bar: the sum takes the unit its rounded factors
        // round, as a sum of differences does.
        if (index == side_hint_node_ && std::isfinite(unit)) [[unlikely]] {
            typed_term settled = result;
            settled.scale = unit;
            settle_rounded_side(settled, literal_base);
            unit = settled.scale;
        }
        cut_literals_to(literal_base);
    }
    result.scale = unit;
    result.exact_scale.reset();
    const double slack = tolerance + 1e-9 * std::abs(final_origin) + 1e-9;
    // Readings whose weights make neither one reading nor a difference: "T_s + T_a/2",
    // "T_hi + T_ho" before it is halved. Kept with their weight, for a factor to bring it
    // to 1 ((T_1 + T_2)/2) or for the equation to report.
    // Where every weight is 1 or -1 the count of readings below says the same.
    if (!has_shift && unit_terms >= 2 && weight && !(*weight == rational(1)) &&
        !weight->is_zero() && !(*weight == rational(points))) {
        const double w = weight->to_double();
        result.point = true;
        result.origin = weighted_origin / w;
        result.origin_tolerance = tolerance / std::abs(w);
        result.offset = std::abs(result.origin) > slack
                            ? scale_named(result.origin, slack, result.dim, terms)
                            : nullptr;
        set_weight(result, weight);
        result.weighted_sum = result.weight_denominator != 0;
        return result;
    }
    if (points == 0) {
        if (std::abs(final_origin) > slack) {
            const unit_definition* zero = has_shift || !is_whole_side(index)
                                              ? nullptr
                                              : subtracted_scale_zero(terms, final_origin, slack);
            if (zero != nullptr) {
                result.point = true;
                result.origin = 0.0;
                result.origin_tolerance = tolerance;
                result.zero_of = zero;
                return result;
            }
            report_mixed_scales(terms, final_origin);
            cut_literals_to(literal_base);
            return unknown_type();
        }
        result.absolute_pressure_difference =
            !has_shift && result.dim == pressure_dimension() &&
            std::all_of(terms.begin(), terms.end(), [](const operand& t) {
                return !t.type.known || !t.type.point || t.type.offset == nullptr;
            });
        return result; // an ordinary difference
    }
    result.point = true;
    if (points != 1) {
        // A sum of two readings on one scale, halved for the mean: its zero is the scale's.
        result.offset = scale_named(final_origin / points, slack, result.dim, terms);
        result.origin = final_origin / points;
        result.origin_tolerance = std::numeric_limits<double>::infinity();
        // Until halved, the sum weighs 2: "T_m = T_hi + T_ho" is reported at the equation.
        if (weight && !has_shift && !weight->is_zero()) {
            set_weight(result, weight);
            result.weighted_sum = result.weight_denominator != 0 && !(*weight == rational(1));
        } else {
            // Its zero, shifted by a number among weighed readings, is not followed: no
            // weight of 1 may make it a reading held to it (see reading_tolerance).
            result.weight_denominator = 0;
        }
        return result;
    }
    result.origin = final_origin;
    result.origin_tolerance = tolerance;
    result.offset = std::abs(final_origin) > slack
                        ? scale_named(final_origin, slack, result.dim, terms)
                        : nullptr;
    return result;
}

} // namespace plumb::formula_check
