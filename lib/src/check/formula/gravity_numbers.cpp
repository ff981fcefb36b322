// Numbers that carry g, a liquid column or an atmosphere in a conversion written into the
// formula, read where a term's dimension is short by exactly that quantity.
#include "check/formula/checker.hpp"

#include "model/ascii_case.hpp"

namespace plumb::formula_check {

// "p_abs = 9.81*h + 101.325", "p_a = 0.433*h_ft + 14.7", "ρ*g*h/1000 + 101.325": a
// column's pressure plus the atmosphere written as a bare number, the absolute pressure at
// depth. The number is read as a standard reference pressure in the unit of the sum's
// pressure term, or of the equation's other side where no term of the sum is a pressure
// yet, and the column's number against that unit as the gravity readings are. Tried on
// short sums with one such number only, and undone unless every term then agrees.
bool checker::read_column_and_atmosphere(std::size_t base, std::uint32_t sum_node) {
    // Below the count where equal types are shared (push_operand_type), so that each term's
    // type is its own to change.
    constexpr std::size_t most_terms = 15;
    const std::size_t count = operands_.size() - base;
    if (count > most_terms)
        return false;
    const compact_dimension& pressure = pressure_dimension();
    double unit = std::numeric_limits<double>::quiet_NaN(); // SI per written value
    for (std::size_t i = 0; i < count && !std::isfinite(unit); ++i) {
        const typed_term& t = operands_[base + i].type;
        if (t.known && !t.numeric && t.dim == pressure)
            unit = unit_as_written(t);
    }
    if (!std::isfinite(unit) && sum_node == side_hint_node_ && side_hint_ != nullptr &&
        side_hint_->known && !side_hint_->numeric && side_hint_->dim == pressure)
        unit = side_hint_->scale;
    if (!(unit > 0) || !std::isfinite(unit))
        return false;
    std::size_t atmosphere = count;
    for (std::size_t i = 0; i < count; ++i) {
        const operand& op = operands_[base + i];
        const typed_term& t = op.type;
        if (op.subtracted || !t.known || !t.numeric || t.zero || t.literal_count != 1)
            continue;
        const scale_literal& l = literals_[t.literal_begin];
        // "97.5 - 3.386*v_op": the site's declared barometer typed as its number.
        const site_barometer* site = declared_site_barometer();
        const bool the_site = site != nullptr && std::abs(l.value * unit / site->pascals - 1.0) <=
                                                     site_barometer_slack_in_difference;
        if (l.exponent != 1.0 ||
            (!the_site && read_reference_state(pressure, l.value, text(file_.nodes[l.node].range),
                                               unit) == nullptr))
            continue;
        if (atmosphere != count)
            return false; // two atmospheres: no reading
        atmosphere = i;
    }
    if (atmosphere == count)
        return false;
    // p_2/6.895 + 14.7 with p_2 an absolute reading in kPa: its atmosphere is in it already,
    // and no column's pressure is there for the number to be added to.
    for (std::size_t i = 0; i < count; ++i) {
        const typed_term& t = operands_[base + i].type;
        if (i != atmosphere && t.known && t.point && t.offset == nullptr &&
            !t.absolute_pressure_difference && t.dim == pressure)
            return false;
    }
    // Kept to undo the readings.
    std::array<typed_term, most_terms> saved_types;
    for (std::size_t i = 0; i < count; ++i)
        saved_types[i] = operands_[base + i].type;
    std::uint32_t literal_from = static_cast<std::uint32_t>(literals_.size());
    for (std::size_t i = 0; i < count; ++i)
        literal_from = std::min(literal_from, operands_[base + i].type.literal_begin);
    const std::vector<scale_literal> saved_literals(literals_.begin() + literal_from,
                                                    literals_.end());
    const std::size_t findings_before = out_.size();

    auto& t = const_cast<typed_term&>(operands_[base + atmosphere].type);
    scale_literal& number = literals_[t.literal_begin];
    const std::uint32_t number_node = number.node;
    const double atmosphere_pascals = number.value * unit;
    const reference_state* state =
        read_reference_state(pressure, number.value, text(file_.nodes[number_node].range), unit);
    t.dim = pressure;
    t.scale = unit;
    t.exact_scale.reset();
    t.numeric = false;
    t.value.reset();
    t.point = true; // the atmosphere is an absolute reading
    t.origin = 0.0;
    t.origin_tolerance = 0.0;
    read_as_quantity(number);
    const std::span<const operand> terms(operands_.data() + base, count);
    agreement a = find_agreement(terms);
    if (!a.odd.empty() || !a.reference || !(*a.reference == pressure)) {
        agreement towards_pressure;
        towards_pressure.reference = pressure;
        for (std::size_t i = 0; i < count; ++i)
            if (terms[i].type.known && !terms[i].type.zero && !(terms[i].type.dim == pressure))
                towards_pressure.odd.push_back(i);
        read_gravity_numbers(base, towards_pressure, syntax::no_index, unit);
        a = find_agreement(terms);
    }
    if (!a.odd.empty() || !a.reference || !(*a.reference == pressure)) {
        for (std::size_t i = 0; i < count; ++i)
            const_cast<typed_term&>(operands_[base + i].type) = saved_types[i];
        cut_literals_to(literal_from);
        literals_.insert(literals_.end(), saved_literals.begin(), saved_literals.end());
        out_.erase(out_.begin() + static_cast<std::ptrdiff_t>(findings_before), out_.end());
        return false;
    }
    // "ρ*g*h/1000 + 101.325" where the file declares its site's barometer at 95 kPa: the
    // column's foot is at the site's atmosphere plus the column, not the sea level's.
    // Not "((101.325 + p_z)/101.325 + O_t/21)", an oxygen transfer's standard conditions,
    // which set the whole formula at the sea level's atmosphere (ASCE 2-06, from memory).
    const auto another_standard_atmosphere = [&] {
        const auto standard = [&](std::uint32_t at, const syntax::expr_node& n) {
            return at != number_node && n.kind == expr_kind::number &&
                           std::abs(written_number(n.range) * unit / standard_atmosphere - 1.0) <=
                               0.005
                       ? search_step::found
                       : search_step::descend;
        };
        return current_ != nullptr ? syntax::search_formula(file_, *current_, standard)
                                   : syntax::search_subtree(file_, sum_node, standard);
    };
    if (const site_barometer* site = declared_site_barometer();
        site != nullptr && std::abs(atmosphere_pascals / standard_atmosphere - 1.0) <= 0.005 &&
        std::abs(atmosphere_pascals / site->pascals - 1.0) > site_barometer_slack &&
        !another_standard_atmosphere()) {
        report_atmosphere_not_the_site(number_node, "the atmosphere at sea level",
                                       atmosphere_pascals, *site, unit, false);
        return true;
    }
    if (state == nullptr) {
        const site_barometer& site = *declared_site_barometer();
        diagnostic& d = report(rules::trade_constant,
                               fmt::format("'{}' is read as the site's barometer '{}', typed as "
                                           "its number",
                                           display_text(file_.nodes[number_node].range), site.name),
                               file_.nodes[number_node].range);
        d.level = severity::note;
        d.notes.push_back({fmt::format("write '{}' to say so", site.name), {}});
        return true;
    }
    diagnostic& d =
        report(rules::trade_constant,
               fmt::format("'{}' is read as the atmospheric pressure added to a column's pressure: "
                           "{} in the units around it",
                           display_text(file_.nodes[number_node].range), state->what),
               file_.nodes[number_node].range);
    d.level = severity::note;
    d.notes.push_back(
        {fmt::format("the trades' choices: {}; above sea level the atmosphere is less",
                     state->choices),
         {}});
    d.notes.push_back({"declare it with its unit (p_atm : kPa = 101.325) to say so", {}});
    return true;
}

// "Q_oa = w_lbh/(4.5*ΔW)": the moisture load solved for the air's flow, which is then the
// quantity the term is weighed against rather than one of its factors.
carried_quantity::term_kind checker::kind_of(const typed_term& t,
                                             const compact_dimension& reference) {
    const carried_quantity::term_kind kind = kind_of(t);
    if (kind == carried_quantity::term_kind::any && !t.numeric &&
        (reference == volume_flow_dimension() || reference == volume_flow_enthalpy_dim))
        return carried_quantity::term_kind::volume_flow;
    return kind;
}

// Whether any of a term's numbers could carry a quantity the term lacks (the cheap test
// before a reading); their texts go to `texts`, as the reading wants them.
bool checker::numbers_could_carry(std::span<const scale_literal> numbers, const dimension& lacking,
                                  std::span<std::string_view> texts) const {
    bool any = false;
    for (std::size_t k = 0; k < numbers.size() && k < texts.size(); ++k) {
        texts[k] = text(file_.nodes[numbers[k].node].range);
        any = any || lacks_gravity_number(lacking, numbers[k].exponent);
    }
    return any;
}

// The air's density in a total load, 4.5·cfm·Δh or 1.2·(L/s)·Δh, as in its moisture.
carried_quantity::term_kind checker::kind_of(const typed_term& t) {
    using term_kind = carried_quantity::term_kind;
    return t.numeric ? term_kind::any
           : t.dim == volume_flow_dimension() || t.dim == volume_flow_enthalpy_dim
               ? term_kind::volume_flow
           : t.dim == velocity_squared_dimension() ? term_kind::velocity_squared
           : t.dim == power_dim || t.dim == energy_dim || t.dim == volume_dim ? term_kind::fuel_gas
                                                                              : term_kind::any;
}

// As read_gravity_numbers, and where that fails because the number stands in the terms that
// make the majority ("0.433*h_s + p_t": one term each way, the first taken as reference),
// read them against the dimension of the first plain term that differs instead.
bool checker::read_gravity_numbers_either_way(std::size_t base, const agreement& a,
                                              std::uint32_t sum_node) {
    if (read_gravity_numbers(base, a, sum_node))
        return true;
    const std::size_t count = operands_.size() - base;
    agreement flipped;
    for (const std::size_t i : a.odd) {
        const typed_term& t = operands_[base + i].type;
        if (t.known && !t.zero && !t.numeric && t.literal_count == 0) {
            flipped.reference = t.dim;
            break;
        }
    }
    // Or the dimension of the equation's other side, where the odd terms all convert.
    if (!flipped.reference && sum_node != syntax::no_index && sum_node == side_hint_node_ &&
        side_hint_ != nullptr && side_hint_->known && !(side_hint_->dim == *a.reference))
        flipped.reference = side_hint_->dim;
    if (!flipped.reference)
        return false;
    for (std::size_t i = 0; i < count; ++i) {
        const typed_term& t = operands_[base + i].type;
        if (t.known && !t.zero && !(t.dim == *flipped.reference))
            flipped.odd.push_back(i);
    }
    return read_gravity_numbers(base, flipped, sum_node);
}

// The argument of exp, ln or a sine at `k` among the operands from `base`, read against a pure
// number of scale 1: where one of its numbers carries the quantity it lacks, as the static gas
// column's 0.01875 °R/ft does, that number is read so and the argument is a pure number.
void checker::read_gravity_number_in_argument(std::size_t base, std::size_t k) {
    agreement a;
    a.reference = compact_dimension{};
    a.odd.push_back(k);
    read_gravity_numbers(base, a, syntax::no_index, 1.0);
}

// Where the odd operands lack exactly an acceleration (or have one too many) and each holds
// g_n written as a number in its own units, the number is read as g_n: the operand takes the
// reference's dimension and the scale g_n gives it, and a note says which number was read so.
bool checker::read_gravity_numbers(std::size_t base, const agreement& a, std::uint32_t sum_node,
                                   double reference_scale) {
    if (!a.reference)
        return false;
    const std::size_t count = operands_.size() - base;
    const auto is_odd = [&](std::size_t i) {
        return std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end();
    };
    for (std::size_t i = 0; i < count && !std::isfinite(reference_scale); ++i) {
        const typed_term& t = operands_[base + i].type;
        if (!is_odd(i) && t.known && !t.zero && !t.numeric && t.dim == *a.reference &&
            t.literal_count == 0 && std::isfinite(t.scale)) {
            reference_scale = t.scale;
            break;
        }
    }
    // "H_ft = 2.31*p + z_m/0.3048": no term of the sum is plainly in the head's unit, but
    // the equation's other side is.
    if (!std::isfinite(reference_scale) && sum_node != syntax::no_index &&
        sum_node == side_hint_node_ && side_hint_ != nullptr && side_hint_->known &&
        side_hint_->dim == *a.reference && side_hint_->literal_count == 0)
        reference_scale = side_hint_->scale;
    if (!std::isfinite(reference_scale))
        return false;
    struct found {
        std::size_t operand;
        gravity_reading reading;
    };
    std::array<found, 4> readings{};
    std::size_t found_count = 0;
    // Terms whose g is read by its value alone: (operand, number among its literals).
    std::array<std::pair<std::size_t, std::size_t>, 4> by_value{};
    std::size_t by_value_count = 0;
    std::array<std::string_view, 8> texts{};
    for (const std::size_t i : a.odd) {
        const typed_term& t = operands_[base + i].type;
        // 2.31*p_g beside a head: a gauge pressure in feet of water, as p_g/(ρ*g) is.
        const bool gauge_to_head = t.offset != nullptr &&
                                   compact_dimension(t.offset->dim()) == pressure_dimension() &&
                                   *a.reference == length_dimension();
        // A bare number is read too when it stands for the whole quantity: the 9.81 of
        // (γ_sat - 9.81)*z is water's specific weight in kN/m³.
        if (found_count == readings.size() || !t.known || (t.numeric && t.literal_count != 1) ||
            (t.offset != nullptr && !gauge_to_head) || t.literal_count == 0 ||
            t.literal_count > texts.size())
            return false;
        // "η = 1 - C_out/C_in" with mg/L over ppm: set equal to a pure number, the sum is one,
        // and its bare number is the unity it looks, not water's density in kg/L.
        if (t.numeric && sum_node != syntax::no_index && sum_node == side_hint_node_ &&
            side_hint_ != nullptr && side_hint_->known && side_hint_->dim.is_dimensionless())
            return false;
        dimension lacking;
        try {
            lacking = (*a.reference / t.dim).expand();
        } catch (const std::exception&) {
            return false;
        }
        const std::span<const scale_literal> numbers(literals_.data() + t.literal_begin,
                                                     t.literal_count);
        // "(V_b^2 - v_fps^2)/(2*9.81*0.7)": the sum inside was found in two units, so the
        // term's scale is unknown and no range can be weighed; its g is read by its value
        // alone, so that the slip is reported once, as the unit-scale warning it is.
        if (!std::isfinite(t.scale)) {
            const auto g =
                std::find_if(numbers.begin(), numbers.end(), [&](const scale_literal& l) {
                    return is_typed_gravity(l) &&
                           std::abs(l.exponent * 2.0 - std::round(l.exponent * 2.0)) < 1e-9 &&
                           std::abs(l.exponent) <= 2.0 && l.exponent != 0.0 &&
                           acceleration_dimension().expand().pow(rational(
                               static_cast<std::int64_t>(std::round(l.exponent * 2.0)), 2)) ==
                               lacking;
                });
            if (g == numbers.end() || by_value_count == by_value.size())
                return false;
            by_value[by_value_count++] = {i, static_cast<std::size_t>(g - numbers.begin())};
            continue;
        }
        if (!numbers_could_carry(numbers, lacking, texts))
            return false;
        // "V*f_pct/100/m_d" with f_pct in %: the 100 is the percentage's, never one over
        // water's density that the % makes of it.
        const bool beside_percentage =
            for_each_factor(operands_[base + i].node, [&](std::uint32_t at, int) {
                return dimensionless_unit_size(at) == std::optional<double>(0.01);
            });
        const auto reading = read_gravity_number(
            t.scale, reference_scale, numbers, {texts.data(), numbers.size()}, lacking, true,
            kind_of(t, *a.reference), clock_units_of_formula(), beside_percentage);
        // A bare number standing for the whole quantity is that quantity in the others'
        // unit or nothing: "ρ_p - 1" beside kg/m³ is no water density a thousand apart.
        if (!reading || (t.numeric && reading->shifted))
            return false;
        readings[found_count++] = {i, *reading};
    }
    for (std::size_t r = 0; r < by_value_count; ++r) {
        auto& t = const_cast<typed_term&>(operands_[base + by_value[r].first].type);
        t.dim = *a.reference;
        read_as_quantity(literals_[t.literal_begin + by_value[r].second]);
    }
    for (std::size_t r = 0; r < found_count; ++r) {
        // Its own type: a term with numbers shares it with no other operand.
        auto& t = const_cast<typed_term&>(operands_[base + readings[r].operand].type);
        scale_literal& number = literals_[t.literal_begin + readings[r].reading.literal];
        t.dim = *a.reference;
        t.scale = readings[r].reading.term_scale;
        t.exact_scale.reset();
        t.offset = nullptr;
        t.point = false;
        t.origin = 0.0;
        t.origin_tolerance = 0.0;
        // A column's pressure written with its number (0.433*h, ρ*9.81*h) is a difference
        // a gauge may read, as ρ*g*h is.
        t.absolute_pressure_difference = t.dim == pressure_dimension();
        const std::uint32_t node = number.node;
        const double written_value = number.value;
        const bool multiplies = number.exponent > 0;
        // The number is g_n now, not a factor for the scale rules to weigh.
        read_as_quantity(number);
        const std::string written = display_text(file_.nodes[node].range);
        const gravity_reading& reading = readings[r].reading;
        if (reading.flipped) {
            // "Q*H*3960": the number fits only as a divisor; as written the term is off by
            // its square and differs in dimension, and the cure is to move the number.
            const bool divides = number.exponent > 0;
            diagnostic& d = report(
                rules::unit_scale,
                fmt::format("the factor {} is the wrong way round: it carries {} and needs {}",
                            written, reading.quantity->what,
                            divides ? "a division by it, not a multiplication"
                                    : "a multiplication by it, not a division"),
                file_.nodes[node].range);
            add_term(d, operands_[base + readings[r].operand]);
            d.notes.push_back({gravity_message(written, reading), {}});
            continue;
        }
        if (((symbols_.unit_marks() & at_reference_conditions) != 0 ||
             file_.functions == syntax::function_names::spreadsheet) &&
            is_molar_volume(*reading.quantity) &&
            report_molar_volume_off_reference(base, count, readings[r].operand, written_value,
                                              multiplies, reading, node)) [[unlikely]]
            continue;
        diagnostic& d = report(reading.quantity->rule, gravity_message(written, reading),
                               file_.nodes[node].range);
        d.level = severity::note;
        // "W_kip = 2.2046*m_t": g and kN per kip in one number; {g_n} alone would drop
        // the conversion, which the advice keeps.
        const carried_quantity& q = *reading.quantity;
        if (!reading.reciprocal && !q.named.empty() && q.least > 0 &&
            std::abs(reading.stands_for / q.least - 1.0) > 1e-3) [[unlikely]] {
            // A power of ten that the rounding of the numbers around it (6895 Pa per psi)
            // moved off its digits is said as the power of ten.
            double ratio = reading.stands_for / q.least;
            if (const double decade = std::pow(10.0, std::round(std::log10(ratio)));
                std::abs(ratio / decade - 1.0) < 1e-3)
                ratio = decade;
            const std::string conversion = format_factor(ratio);
            d.notes.push_back(
                {fmt::format("{} holds a conversion between the units around it as well "
                             "({} times {}): write {}*{} instead to say so, or declare the "
                             "symbols in coherent units",
                             written, q.named, conversion, q.named, conversion),
                 {}});
        } else {
            d.notes.push_back({std::string(q.advice_in_notation), {}});
        }
        if (is_water_density_or_weight(*reading.quantity)) [[unlikely]]
            report_specific_gravity_against_water(operands_[base + readings[r].operand], reading,
                                                  multiplies, written);
        else if (reading.quantity->only_in == carried_quantity::term_kind::volume_flow ||
                 reading.quantity->what == "the heat capacity of a volume of air") [[unlikely]]
            report_standard_air_number_on_actual_flow(operands_[base + readings[r].operand],
                                                      reading, written, node);
    }
    return true;
}

// The units of time and the grain the symbols of the formula being checked are declared in
// (see clock_units_in).
unsigned checker::clock_units_of_formula() const {
    unsigned found = 0;
    if (current_ == nullptr)
        return found;
    syntax::search_formula(file_, *current_, [&](std::uint32_t, const syntax::expr_node& n) {
        if (n.kind == expr_kind::symbol)
            if (const symbol_entry* e = symbols_.find(text(n.range)); e != nullptr)
                found |= clock_units_in(e->unit_text);
        // A workbook's cell, by the unit written for it ("=C57*42/60" into gpm from bbl/h).
        if (n.kind == expr_kind::reference)
            found |= clock_units_in(file_.references[n.lhs].unit_text);
        return search_step::descend;
    });
    return found;
}

// "H = p*2.31*SG": a liquid's specific weight is its specific gravity times water's, so
// the SG goes wherever γ_w goes: above with 0.433 psi/ft, below with 2.31 ft/psi and 3960.
// The units cannot see an SG on the wrong side (it is a pure number), but the number read
// as water's says which side that is. A symbol is taken for an SG by its description
// ("specific gravity", "relative density") or its name (SG, SG_m).
void checker::report_specific_gravity_against_water(const operand& term,
                                                    const gravity_reading& reading, bool multiplies,
                                                    const std::string& written) {
    const int water_power = (reading.reciprocal ? -1 : 1) * (multiplies ? 1 : -1);
    std::uint32_t against = syntax::no_index;
    for_each_factor(term.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::reference) {
            // A workbook's cell whose row label says so (the front end reads it).
            if (!file_.references[n.lhs].specific_gravity)
                return false;
        } else {
            if (n.kind != expr_kind::symbol)
                return false;
            const std::string_view name = text(n.range);
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || !e->compact_dim || !e->compact_dim->is_dimensionless() ||
                !names_specific_gravity(name, e->description))
                return false;
        }
        if (sign != water_power)
            against = at;
        return against != syntax::no_index;
    });
    if (against == syntax::no_index)
        return;
    const char* water_at = water_power > 0 ? "numerator" : "denominator";
    const char* sg_at = water_power > 0 ? "denominator" : "numerator";
    diagnostic& d =
        report(rules::gravity_number,
               fmt::format("{} is a specific gravity, but it stands in the {} while the "
                           "specific weight of water that {} carries stands in the {}: a "
                           "liquid's specific weight is its specific gravity times water's, "
                           "so as written the result is off by SG squared",
                           quote(against), sg_at, written, water_at),
               file_.nodes[against].range);
    d.level = severity::warning;
    add_term(d, term);
    d.notes.push_back({fmt::format("move {} to the {}, beside water's specific weight, as in "
                                   "p*2.31/SG, 0.433*SG*h and Q*H*SG/3960",
                                   quote(against), water_at),
                       {}});
}

// "1.08*Q_acfm*ΔT" on a dryer's exhaust: the air trade's numbers hold the density of
// standard air (0.075 lb/ft³, ASHRAE Fundamentals, ch. 1, from memory), so they want a flow
// at standard conditions; a flow in actual cubic feet at 300 °F is some 30 % less dense.
// Said where a flow in the term is declared in acfm or described as actual.
void checker::report_standard_air_number_on_actual_flow(const operand& term,
                                                        const gravity_reading& reading,
                                                        const std::string& written,
                                                        std::uint32_t node) {
    std::uint32_t actual = syntax::no_index;
    for_each_factor(term.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind != expr_kind::symbol || sign < 0)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || !e->compact_dim || !(*e->compact_dim == volume_flow_dim))
            return false;
        const std::string lower = lower_ascii(e->description);
        if (e->unit_text.find("acfm") != std::string_view::npos ||
            lower.find("actual") != std::string::npos ||
            lower.find("line conditions") != std::string::npos)
            actual = at;
        return actual != syntax::no_index;
    });
    if (actual == syntax::no_index)
        return;
    diagnostic& d =
        report(rules::trade_constant,
               fmt::format("{} carries {} for standard air, but {} is a flow at actual conditions: "
                           "at another temperature or pressure the air's density, and the number, "
                           "differ",
                           written, reading.quantity->what, quote(actual)),
               file_.nodes[node].range);
    d.level = severity::warning;
    add_term(d, term);
    d.notes.push_back({"correct the flow to standard conditions first, or write the air's "
                       "density at its temperature and pressure with c_p",
                       {}});
}

bool checker::is_water_density_or_weight(const carried_quantity& q) {
    return q.what == "the specific weight of water" || q.what == "the density of water";
}

// "C_mg = C_ppm*M/24.45" in mg/Nm³: 24.45 L/mol is a gas at 25 °C, and a normal cubic metre
// one at 0 °C, where the molar volume is 22.41 L/mol (V_m = R·T/p at 101.325 kPa, R from
// CODATA 2018): the result is 9 % off. Within 2 % nothing is said, for the US trades'
// 385.3 scf/lbmol at 68 °F beside a standard cubic foot at 60 °F is their convention.
bool checker::report_molar_volume_off_reference(std::size_t base, std::size_t count,
                                                std::size_t odd, double written, bool multiplies,
                                                const gravity_reading& reading,
                                                std::uint32_t node) {
    std::optional<reference_volume> volume;
    std::uint32_t volume_node = syntax::no_index;
    for (std::size_t j = 0; j < count; ++j) {
        const std::optional<reference_volume> v = reference_volume_of(operands_[base + j].node);
        if (!v)
            continue;
        if (volume && volume->kelvins != v->kelvins)
            return false; // two reference states: the reference-temperature rule speaks
        volume = v;
        if (volume_node == syntax::no_index || j != odd)
            volume_node = operands_[base + j].node;
    }
    if (!volume)
        return false;
    const std::optional<molar_volume_mismatch> off =
        molar_volume_off_reference(reading, written, multiplies, volume->kelvins);
    if (!off)
        return false;
    diagnostic& d =
        report(rules::unit_scale,
               molar_volume_message(quote(node), reading, *off,
                                    fmt::format("of {}", quote(volume_node)), volume->name),
               file_.nodes[node].range);
    d.level = severity::warning;
    add_term(d, operands_[base + odd]);
    d.notes.push_back({molar_volume_advice(*off), {}});
    return true;
}

} // namespace plumb::formula_check
