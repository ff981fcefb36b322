// Readings on offset scales inside products: where a °C or gauge value needs its absolute
// counterpart, and the reference states that make a ratio one.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// W/K or W/(m²·K) times a temperature: a heat flow or a heat flux. Not J/K, which n·R_u
// is as well as m·c_p: a gas law's p·V is an energy.
bool checker::is_heat_per_degree(const compact_dimension& partner) {
    const std::string_view name = quantity_name((partner * temperature_dimension()).expand());
    return name == "power" || name == "heat flux or irradiance";
}

// ρ·c·t, m·c·t in "V = 3600*Q/(ρ*c*t_out)": a heat capacity per volume or per mass beside the
// reading, where the formula holds a specific heat by its name or description (c_p, c_w,
// "specific heat"): a heat balance, whose reading should be a rise. By dimension alone ρ·c_p
// is ρ·R_s, a gas law's, so the name decides.
bool checker::heat_capacity_in_formula(const compact_dimension& partner) const {
    const compact_dimension heat = partner * temperature;
    if (!(heat == pressure) && !(heat == velocity_squared_dim) && !(heat == energy_dim))
        return false;
    return formula_has_symbol([](std::string_view name, const symbol_entry& e) {
        if (name.starts_with("R"))
            return false;
        const bool named = name.starts_with("c_") || name.starts_with("cp") ||
                           e.description.find("specific heat") != std::string_view::npos ||
                           e.description.find("heat capacity") != std::string_view::npos;
        return named && e.compact_dim && *e.compact_dim == specific_heat_dim;
    });
}

// A symbol of the formula that is a gas constant: of a specific heat's or a molar heat's
// dimension, named R ("R_a", "R_u") or described as one.
bool checker::gas_constant_in_formula() const {
    return formula_has_symbol([](std::string_view name, const symbol_entry& e) {
        if (!e.compact_dim)
            return false;
        const bool named = name == "R" || name.starts_with("R_") ||
                           e.description.find("gas constant") != std::string_view::npos;
        // J/(kg·K) or J/(mol·K).
        constexpr compact_dimension molar_heat = compact_dimension::whole({1, 2, -2, -1, -1, 0, 0});
        return named && (*e.compact_dim == specific_heat_dim || *e.compact_dim == molar_heat);
    });
}

// a in c_p = c_0 + a·t (kJ/(kg·K²)): the slope of a property that is itself per degree.
bool checker::is_slope_of_property(const compact_dimension& partner) {
    try {
        return partner.expand().exponent(base_dimension::temperature) < rational(-1);
    } catch (const std::exception&) {
        return false;
    }
}

// α, β·V, R_20·α: a coefficient per degree of whatever it scales. Not where the product
// with a temperature could be a gas law's or a heat's: an energy (n·R·T, m·c_p·T), a
// pressure (ρ·R_s·T), an energy per mass (R_s·T) or per mole (R·T).
bool checker::is_per_degree_coefficient(const compact_dimension& partner) {
    if (is_heat_per_degree(partner))
        return false;
    try {
        const dimension d = partner.expand();
        if (d.exponent(base_dimension::temperature) != rational(-1))
            return false;
        // Per mole as well (R·T with a current beside it, Faraday's gas volume): a gas law,
        // which wants the absolute temperature, not a difference.
        if (d.exponent(base_dimension::amount) < rational(0))
            return false;
        const dimension scaled = (partner * temperature_dimension()).expand();
        const auto is = [&](int m, int l, int t, int n) {
            return scaled.exponent(base_dimension::mass) == rational(m) &&
                   scaled.exponent(base_dimension::length) == rational(l) &&
                   scaled.exponent(base_dimension::time) == rational(t) &&
                   scaled.exponent(base_dimension::amount) == rational(n) &&
                   scaled.exponent(base_dimension::current).is_zero() &&
                   scaled.exponent(base_dimension::luminous_intensity).is_zero();
        };
        return !(is(1, 2, -2, 0) || is(1, -1, -2, 0) || is(0, 2, -2, 0) || is(1, 2, -2, -1));
    } catch (const std::exception&) {
        return false;
    }
}

// "(0.7 + 0.03*t)": a number other than 1 plus a number times a symbol, in either order;
// "1 + α*t" is a coefficient per degree, whose reference the reading should be taken from.
bool checker::linear_fit_on_reading(std::uint32_t node) const {
    node = syntax::inside_brackets(file_, node);
    const syntax::expr_node& sum = file_.nodes[node];
    if (sum.kind != expr_kind::add)
        return false;
    const auto number_times_symbol = [&](std::uint32_t k) {
        const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, k)];
        if (n.kind != expr_kind::multiply)
            return false;
        const expr_kind a = file_.nodes[n.lhs].kind;
        const expr_kind b = file_.nodes[n.rhs].kind;
        return (a == expr_kind::number && b == expr_kind::symbol) ||
               (a == expr_kind::symbol && b == expr_kind::number);
    };
    for (const auto& [constant, slope] :
         {std::pair{sum.lhs, sum.rhs}, std::pair{sum.rhs, sum.lhs}}) {
        const syntax::expr_node& c = file_.nodes[syntax::inside_brackets(file_, constant)];
        if (c.kind == expr_kind::number && number_times_symbol(slope) &&
            read_number(text(c.range)).literal.value != 1.0)
            return true;
    }
    return false;
}

// A value on an offset scale used where only an absolute one makes sense.
void checker::report_offset(std::uint32_t node, const unit_definition& unit, std::string_view where,
                            const compact_dimension* partner) {
    const bool temperature =
        unit.exponents[static_cast<std::size_t>(base_dimension::temperature)] != 0;
    diagnostic& d =
        report(rules::offset_scale,
               fmt::format("{} is on the {} scale, whose zero is arbitrary, so it cannot be {}",
                           quote(node), unit.symbol, where),
               file_.nodes[node].range);
    d.mark_label = fmt::format("on the {} scale, whose zero is arbitrary", unit.symbol);
    // "(T_w - 140 {K})": a number typed in kelvins is an absolute temperature, which a fit
    // written in kelvins (Vogel's viscosity) sets beside an absolute reading.
    if (temperature) {
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, node)];
        const syntax::expr_node* typed =
            sum.kind == expr_kind::subtract || sum.kind == expr_kind::add
                ? &file_.nodes[syntax::inside_brackets(file_, sum.rhs)]
                : nullptr;
        if (typed != nullptr && typed->kind == expr_kind::quantity) {
            const syntax::quantity_literal& q = file_.quantities[typed->lhs];
            if (q.single_unit != nullptr && q.single_unit->offset == 0.0 &&
                std::abs(q.single_unit->factor / unit.factor - 1.0) < 1e-9) {
                const std::string reading =
                    display_text(file_.nodes[syntax::inside_brackets(file_, sum.lhs)].range);
                d.notes.push_back(
                    {fmt::format("{} is typed in {}, an absolute temperature: a fit written in "
                                 "{} takes the reading in {} too, ({} + {:g} {} {}); a "
                                 "reference on the reading's scale is typed in its unit, {{{}}}",
                                 display_text(typed->range), q.single_unit->symbol,
                                 q.single_unit->symbol, q.single_unit->symbol, reading,
                                 unit.offset / unit.factor, sum.kind == expr_kind::add ? "+" : "-",
                                 display_text(typed->range), unit.symbol),
                     {}});
                return;
            }
        }
    }
    if (where == "used in a quotient" && file_.nodes[node].kind != expr_kind::symbol)
        note_bare_fit_on_scale(node);
    // "ΔT : °F": a difference declared in the scale's unit; the Δ unit says what is meant.
    if (file_.nodes[node].kind == expr_kind::symbol) {
        const std::string_view name = text(file_.nodes[node].range);
        const symbol_entry* entry = symbols_.find(name);
        // "θ_max : °C "oil temperature range, -20 to 105 °C"": an end of a range is a
        // reading, whatever the description shared with the other end says.
        const bool range_end = name.ends_with("max") || name.ends_with("min") ||
                               name.find("_max") != std::string_view::npos ||
                               name.find("_min") != std::string_view::npos;
        if (entry != nullptr && entry->offset_unit == &unit && !range_end &&
            names_a_difference(name, entry->description)) {
            d.notes.push_back(
                {fmt::format("its name or description says it is a difference: declare it "
                             "as '{} : \u0394{}', a difference on the {} scale, which may be "
                             "multiplied and divided freely",
                             name, unit.symbol, unit.symbol),
                 {}});
            return;
        }
    }
    // "k*(0.7 + 0.03*t)", Hazen's correction of a permeability to the water's temperature
    // (Terzaghi, Peck and Mesri, 1996, from memory): an empirical fit made on the °C scale
    // holds with the reading as it is, and kelvins would break it.
    if (temperature && linear_fit_on_reading(node)) {
        d.notes.push_back(
            {fmt::format("{} reads as an empirical fit made on the {} scale: it holds only "
                         "with the reading in {}, so adding 273.15 would break it; where the "
                         "fit is the published one, accept this finding with a '# reviewed "
                         "offset-scale: ...' mark naming its source",
                         quote(node), unit.symbol, unit.symbol),
             {}});
        return;
    }
    // A coefficient per degree (α in R_20*(1 + α*T), β in V*β*T) multiplies a difference
    // from its reference temperature, not an absolute temperature.
    if (temperature && partner != nullptr && is_per_degree_coefficient(*partner)) {
        const std::string reference = reference_temperature();
        d.notes.push_back(
            {fmt::format("a coefficient per degree multiplies a temperature difference: "
                         "write ({} - {}) with {} the coefficient's reference temperature "
                         "in {}",
                         display_text(file_.nodes[node].range), reference, reference, unit.symbol),
             {}});
        return;
    }
    // w·R·T/550 with R_a in ft·lbf/(lb·°R): a gas constant has a specific heat's dimension,
    // but R·T is a gas's state or its work (p·v = R·T, a blower's adiabatic power), which
    // takes the absolute temperature, not a difference.
    if (temperature && partner != nullptr && gas_constant_in_formula()) {
        // "(T_F + 273.15)": the reading inside, with the other scale's number replaced.
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, node)];
        const bool number_added =
            (sum.kind == expr_kind::add || sum.kind == expr_kind::subtract) &&
            file_.nodes[syntax::inside_brackets(file_, sum.rhs)].kind == expr_kind::number;
        const std::string reading =
            display_text(number_added ? file_.nodes[syntax::inside_brackets(file_, sum.lhs)].range
                                      : file_.nodes[node].range);
        const double zero = unit.offset / unit.factor;
        const std::string_view absolute_unit =
            std::abs(unit.factor - 1.0) < 1e-12 ? "K" : "\u00B0R";
        // "R_D*(t_w + t_a)/2": two readings added, a mean whose halving stands further on.
        // Each reading is converted, so that the /2, wherever it stands, halves kelvins;
        // "((t_w + t_a) + 273.15)" would leave the mean 136.6 K low.
        const bool a_sum = !number_added && sum.kind == expr_kind::add;
        const std::uint32_t left = a_sum ? syntax::inside_brackets(file_, sum.lhs) : node;
        const std::uint32_t right = a_sum ? syntax::inside_brackets(file_, sum.rhs) : node;
        if (a_sum && file_.nodes[left].kind == expr_kind::symbol &&
            file_.nodes[right].kind == expr_kind::symbol) {
            d.notes.push_back(
                {fmt::format("R times a temperature is a gas law's (p\u00B7v = R\u00B7T, a "
                             "compressor's or blower's power), which takes absolute "
                             "temperature: convert each reading, (({} + {:g}) + ({} + {:g})), "
                             "in {}",
                             display_text(file_.nodes[left].range), zero,
                             display_text(file_.nodes[right].range), zero, absolute_unit),
                 {}});
            return;
        }
        d.notes.push_back(
            {fmt::format("R times a temperature is a gas law's (p\u00B7v = R\u00B7T, a "
                         "compressor's or blower's power), which takes absolute temperature: "
                         "write ({} + {:g}), in {}{}",
                         reading, zero, absolute_unit,
                         number_added ? fmt::format(", in place of {}",
                                                    display_text(file_.nodes[node].range))
                                      : std::string()),
             {}});
        return;
    }
    // U·A·T, ṁ·c_p·T: a heat flow per degree times a reading. What is meant is a
    // difference of two temperatures; converting the reading to kelvins would pass the
    // check and give a value many times too large.
    if (temperature && partner != nullptr &&
        (is_heat_per_degree(*partner) || heat_capacity_in_formula(*partner))) {
        d.notes.push_back(
            {fmt::format("a heat flow per degree (U·A, ṁ·c_p) multiplies a "
                         "temperature difference: write ({} - T_other), with T_other the "
                         "other stream's or side's temperature; the reading converted to "
                         "kelvins would pass this check and be many times too large",
                         display_text(file_.nodes[node].range)),
             {}});
        d.notes.push_back({"a difference of two values on the same scale, such as T_2 - T_1, "
                           "is an ordinary quantity and may be used freely",
                           {}});
        return;
    }
    // "c_p0 + a_c*t_m" with a_c in kJ/(kg·K²): a property's slope per degree in a fit linear
    // in the reading (a vendor's c_p or a density against the °C reading, common practice),
    // whose constant is the property at the fit's zero. Saying that zero makes the product a
    // difference.
    if (temperature && partner != nullptr && is_slope_of_property(*partner)) {
        d.notes.push_back(
            {fmt::format("if this is a fit linear in the reading (c = c_0 + a·t, c_0 the value "
                         "at the fit's zero): write a*({} - t_0) with t_0 : {} = 0 declared, "
                         "or the fit's own reference reading, to say so",
                         display_text(file_.nodes[node].range), unit.symbol),
             {}});
        return;
    }
    // (p_2g/p_1)^n at a site whose barometer the file declares: that barometer is the one to
    // add, not the sea level's.
    // Only for the reading itself: a product around it ("p_g/10") has another unit.
    const expr_kind reading_kind = file_.nodes[syntax::inside_brackets(file_, node)].kind;
    if (!temperature && unit.scale == unit_scale::gauge &&
        (reading_kind == expr_kind::symbol || reading_kind == expr_kind::reference))
        if (std::optional<std::string> site = site_atmosphere_advice(
                display_text(file_.nodes[node].range), unit.factor, absolute_symbol(unit))) {
            d.notes.push_back(
                {fmt::format("gas laws and pressure ratios need absolute pressure; {}", *site),
                 {}});
            d.notes.push_back({"a difference of two values on the same scale, such as p_2 - p_1, "
                               "is an ordinary quantity and may be used freely",
                               {}});
            return;
        }
    // The physics decides which fix is right, and a dimension cannot tell ρ·c_p·T from
    // ρ·R·T: each fix is given with the formulas it suits.
    d.notes.push_back(
        {temperature ? fmt::format("if the law needs absolute temperature (gas laws, Arrhenius, "
                                   "radiation): declare it in K (or °R), or convert the {} value "
                                   "first by adding {:g}",
                                   unit.symbol, unit.offset / unit.factor)
                     : fmt::format("gas laws and pressure ratios need absolute pressure: add the "
                                   "atmospheric pressure, or declare it as an absolute pressure "
                                   "(Pa, bar, psia)"),
         {}});
    d.notes.push_back(
        {temperature
             ? std::string("if it stands for a rise or a drop (a heat balance, an "
                           "expansion): write the difference of two readings, such as "
                           "T_2 - T_1, an ordinary quantity that may be used freely")
             : std::string("a difference of two values on the same scale, such as p_2 - p_1, "
                           "is an ordinary quantity and may be used freely"),
         {}});
}

// "20" from R_20 or T_20 in the formula: the reference temperature a coefficient per
// degree is tabulated at; "T_ref" when the formula names none.
std::string checker::reference_temperature() const {
    std::string found;
    visit_nodes([&](const syntax::expr_node& n) {
        if (n.kind != expr_kind::symbol || !found.empty())
            return;
        const std::string_view name = text(n.range);
        const std::size_t underscore = name.rfind('_');
        if (underscore == std::string_view::npos || underscore + 1 >= name.size())
            return;
        const std::string_view digits = name.substr(underscore + 1);
        // R_20, ρ_15, C_25: the temperatures tables are given at. k_1 or C_10 (the
        // ten-hour rate) number something else.
        if (digits.size() <= 3 && std::all_of(digits.begin(), digits.end(),
                                              [](char c) { return c >= '0' && c <= '9'; })) {
            const int value = std::stoi(std::string(digits));
            if (value >= 15 && value <= 100)
                found = std::string(digits);
        }
    });
    return found.empty() ? std::string("T_ref") : found;
}

// A number read as a reference state, or a gauge reading with its atmosphere, in ratio
// with an absolute reading: the product takes the reading's dimension and unit in its
// place, a pure ratio, and is no reading. False where the dimension overflowed (the
// product is then unknown).
bool checker::pair_number_with_reading(const reference_state_pairs::number& number,
                                       reference_state_pairs::reading& reading,
                                       typed_term& result) {
    reading.paired = true;
    try {
        result.dim = number.sign > 0 ? result.dim * reading.dim : result.dim / reading.dim;
    } catch (const std::exception&) {
        result = unknown_type();
        return false;
    }
    result.scale = number.sign > 0 ? result.scale * reading.scale : result.scale / reading.scale;
    result.exact_scale.reset();
    result.value.reset();
    result.numeric = false;
    result.point = false;
    result.origin = 0.0;
    result.origin_tolerance = 0.0;
    return true;
}

// "F*(p_g + 14.7)/(100 + 14.7)" in a sheet (a leak's flow scaled from the table's 100 psig
// by absolute pressure; common practice): the added numbers are a gauge reading and the
// atmosphere in the unit of the absolute pressure they stand in ratio with, which the
// notation would write 100 {psig}; read so, the ratio is pure, with a note.
bool checker::read_gauge_plus_atmosphere(const reference_state_pairs::number& number,
                                         reference_state_pairs::reading& reading,
                                         typed_term& result) {
    const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, number.node)];
    if (sum.kind != expr_kind::add || !(reading.dim == pressure_dimension()) ||
        file_.nodes[sum.lhs].kind != expr_kind::number ||
        file_.nodes[sum.rhs].kind != expr_kind::number)
        return false;
    std::uint32_t atmosphere = syntax::no_index;
    const reference_state* state = nullptr;
    for (const std::uint32_t side : {sum.rhs, sum.lhs}) {
        const std::string_view written = text(file_.nodes[side].range);
        state = read_reference_state(reading.dim, written_number(file_.nodes[side].range), written,
                                     reading.scale);
        if (state != nullptr) {
            atmosphere = side;
            break;
        }
    }
    if (atmosphere == syntax::no_index)
        return false;
    if (!pair_number_with_reading(number, reading, result))
        return true;
    for (std::uint32_t l = result.literal_begin; l < literals_.size(); ++l)
        if (literals_[l].node == number.node || literals_[l].node == sum.lhs ||
            literals_[l].node == sum.rhs)
            read_as_quantity(literals_[l]);
    const std::uint32_t gauge = atmosphere == sum.rhs ? sum.lhs : sum.rhs;
    diagnostic& d = report(
        rules::trade_constant,
        fmt::format("'{}' is read as a gauge reading, {}, plus the atmosphere, {}, in the unit "
                    "of {}: an absolute pressure, which it stands in ratio with",
                    display_text(file_.nodes[number.node].range),
                    display_text(file_.nodes[gauge].range),
                    display_text(file_.nodes[atmosphere].range), quote(reading.node)),
        file_.nodes[number.node].range);
    d.level = severity::note;
    d.notes.push_back(
        {fmt::format("the trades' atmospheres: {}; above sea level it is less", state->choices),
         {}});
    return true;
}

// "V*273.15/T": each bare number of the product that stands for a standard reference
// temperature or pressure in the unit of an absolute reading it is in ratio with makes,
// with it, a pure ratio. The number is then a quantity, not a factor for the scale rules.
void checker::read_reference_states(reference_state_pairs& pairs, typed_term& result) {
    if (!result.known)
        return;
    for (std::size_t i = 0; i < pairs.number_count; ++i) {
        const reference_state_pairs::number& number = pairs.numbers[i];
        for (std::size_t k = 0; k < pairs.reading_count; ++k) {
            reference_state_pairs::reading& reading = pairs.readings[k];
            if (reading.paired || reading.sign == number.sign)
                continue;
            // "(100 + 14.7)": one number to the product, a sum in the text; (68 + 459.67)
            // is one too, a reference temperature in °R, read below.
            if (file_.nodes[syntax::inside_brackets(file_, number.node)].kind == expr_kind::add &&
                read_gauge_plus_atmosphere(number, reading, result)) [[unlikely]]
                break;
            const std::string_view written = text(file_.nodes[number.node].range);
            // p_b/1000 with p_b in mbar: a power of ten beside a pressure converts its unit
            // (a barometer in mbar added in bar) far more often than it is 1000 mbar.
            const double power = std::round(std::log10(number.value));
            if (power != 0.0 && reading.dim == pressure_dimension() &&
                std::abs(number.value / std::pow(10.0, power) - 1.0) < 1e-12)
                continue;
            const reference_state* state =
                read_reference_state(reading.dim, number.value, written, reading.scale);
            // "p_avg*6.895/101.325" with p_avg in psia: the reading converted to kPa by a
            // number beside it (6.895 kPa per psi, NIST SP 811 (2008), B.8) stands in ratio
            // with the normal state in kPa.
            double converted_scale = reading.scale;
            for (std::size_t c = 0; c < pairs.number_count && state == nullptr; ++c) {
                const reference_state_pairs::number& conversion = pairs.numbers[c];
                if (c == i || conversion.sign != reading.sign)
                    continue;
                const std::string_view digits = text(file_.nodes[conversion.node].range);
                // "101.325/(100*p_2a)" with p_2a in bar: a power of ten converts bar to kPa.
                const double tens = std::round(std::log10(conversion.value));
                const bool power_of_ten =
                    tens != 0.0 && std::abs(conversion.value / std::pow(10.0, tens) - 1.0) < 1e-12;
                if (!power_of_ten &&
                    (significant_digits(digits) < 4 ||
                     !is_ratio_of_units(read_literal(digits, conversion.value, conversion.node))))
                    continue;
                state = read_reference_state(reading.dim, number.value, written,
                                             reading.scale / conversion.value);
                if (state != nullptr)
                    converted_scale = reading.scale / conversion.value;
            }
            if (state == nullptr)
                continue;
            // The number stands in the unit it is written in, the converted one where a
            // conversion led to it; the conversion stays a factor of the product.
            const double reading_scale = reading.scale;
            reading.scale = converted_scale;
            const bool paired = pair_number_with_reading(number, reading, result);
            reading.scale = reading_scale;
            if (!paired)
                return;
            for (std::uint32_t l = result.literal_begin; l < literals_.size(); ++l) {
                scale_literal& literal = literals_[l];
                if (literal.node != number.node)
                    continue;
                read_as_quantity(literal);
            }
            diagnostic& d =
                report(rules::trade_constant,
                       fmt::format("'{}' is read as {} in the unit of {}, which it stands in ratio "
                                   "with",
                                   display_text(file_.nodes[number.node].range), state->what,
                                   quote(reading.node)),
                       file_.nodes[number.node].range);
            d.level = severity::note;
            d.notes.push_back({fmt::format("the trades' choices: {}; the contract or permit "
                                           "decides which",
                                           state->choices),
                               {}});
            // In the reading's own system: "(60 + 460)" beside °R readings is declared in °R,
            // "/14.7" beside psia in psia.
            constexpr double psi = 6894.757293168;
            if (reading.dim == temperature_dimension() &&
                std::abs(reading.scale * 1.8 - 1.0) < 1e-9)
                d.notes.push_back(
                    {"declare it with its unit (T_n : \u00B0R = 519.67) to say so", {}});
            else if (reading.dim == pressure_dimension() &&
                     std::abs(reading.scale / psi - 1.0) < 1e-6)
                d.notes.push_back({"declare it with its unit (p_n : psia = 14.696) to say so", {}});
            else
                d.notes.push_back({std::string(state->advice), {}});
            break;
        }
    }
}

// Whether a product is a pressure scaled by the shape of a wall: every factor beside its
// pressures, looked at through parentheses, powers and sums, is a number, a pure ratio, a
// length or an area (p_g*D/(2*t), 2*S*t/D, p_g/SG), not the state of a gas (p_g*V_1/V_2,
// p_g*(T_2/T_1), ρ*R*T). Such a product is a net pressure across the wall, which a gauge
// reads. With a gauge pressure in it, any number of gauge pressures may stand; without,
// exactly one pressure of another kind (the allowable stress). Walked with a stack of its
// own, as a product may be nested a million deep.
bool checker::pressure_scaled_by_shape(std::uint32_t product, bool with_gauge,
                                       bool* geometric) const {
    const syntax::expr_node& root = file_.nodes[product];
    if (root.kind != expr_kind::multiply && root.kind != expr_kind::divide)
        return false;
    int other_pressures = 0;
    int stresses = 0;
    int densities = 0;
    bool water = false;
    bool shape = false;
    if (geometric != nullptr)
        *geometric = false;
    std::vector<std::uint32_t> pending{product};
    while (!pending.empty()) {
        const syntax::expr_node& n = file_.nodes[pending.back()];
        pending.pop_back();
        switch (n.kind) {
        case expr_kind::multiply:
        case expr_kind::divide:
            // p_1g*p_2g/(p_1g + p_2g): gauge pressures multiplied or divided by one
            // another are a gas law's, not a gauge reading scaled.
            if (with_gauge && holds_gauge(n.lhs) && holds_gauge(n.rhs))
                return false;
            pending.push_back(n.lhs);
            pending.push_back(n.rhs);
            break;
        case expr_kind::add:
        case expr_kind::subtract:
            // "(p_st + Δp_J)*D/(2*t)": a gauge reading plus a surge's rise is the gauge
            // reading the wall sees (Barlow's hoop stress; common practice), one factor, whose
            // sum has been checked as such.
            if (with_gauge && holds_gauge(n.lhs) != holds_gauge(n.rhs))
                break;
            pending.push_back(n.lhs);
            pending.push_back(n.rhs);
            break;
        case expr_kind::group:
        case expr_kind::negate:
        case expr_kind::power: // (D/t)^2: the base decides
            pending.push_back(n.lhs);
            break;
        case expr_kind::number:
        case expr_kind::pi:
            break;
        case expr_kind::symbol:
        case expr_kind::reference: { // a workbook's cell, typed by the unit written for it
            typed_term cell;
            const typed_term* found = &cell;
            if (n.kind == expr_kind::reference) {
                const syntax::reference_value& r = file_.references[n.lhs];
                if (!r.dim)
                    return false;
                cell.dim = compact_dimension(*r.dim);
                cell.offset = r.offset;
            } else {
                const symbol_entry* entry = symbols_.find(text(n.range));
                if (entry == nullptr || !entry->checked_type || !entry->checked_type->known)
                    return false;
                found = &*entry->checked_type;
            }
            const typed_term& t = *found;
            if (t.dim == pressure_dimension()) {
                const bool gauge = t.offset != nullptr && t.offset->scale == unit_scale::gauge;
                // 1.3*MAWP*S_amb/S, the hydrotest pressure: a ratio of stresses is pure.
                if (with_gauge && !gauge && !t.point) {
                    ++stresses;
                    break;
                }
                if (gauge != with_gauge || (!gauge && ++other_pressures > 1))
                    return false;
            } else if (t.dim.is_dimensionless() || t.dim == length_dimension() ||
                       t.dim == area_dimension()) {
                shape = true;
                if (geometric != nullptr && !t.dim.is_dimensionless())
                    *geometric = true;
            } else if (t.dim == density_dim && n.kind == expr_kind::symbol) {
                // "2.31*p_d/(ρ_sl/ρ_w)": a liquid's specific gravity, its density over
                // water's; not "p_g*ρ_2/ρ_1", a gas's densities, which a gas law weighs.
                ++densities;
                const std::string_view name = text(n.range);
                const symbol_entry* e = symbols_.find(name);
                water = water || name.ends_with("_w") ||
                        (e != nullptr && e->description.find("water") != std::string_view::npos);
            } else {
                return false;
            }
            break;
        }
        default:
            return false;
        }
    }
    if (densities % 2 != 0 || (densities > 0 && !water))
        return false;
    return with_gauge ? stresses % 2 == 0 : (other_pressures == 1 && shape);
}

// P·ID/(E·WT), p_g*V/K_w: a gauge reading over an elastic modulus, scaled by lengths, areas,
// volumes and pure numbers, is the strain (or the volume change) the net pressure across a
// wall or in a liquid causes, which a gauge reads: a prover's CPS (API MPMS ch. 12.2, from
// memory) and a hydrotest's added volume (common practice). Over a strength or a stress,
// P·D/(2·t·SMYS) is the hoop stress's share of the yield (ASME B31.8, 841.1.1, from memory),
// and u/σ_v a pore pressure's of the overburden: ratios of stresses. The modulus or stress is
// a symbol named E or σ, or described as one, or a cell whose row label says so.
bool checker::gauge_over_modulus(std::uint32_t product) const {
    int gauges = 0;
    int moduli = 0;
    // A pressure: the gauge reading above, or the material's stress below.
    const auto pressure = [&](bool gauge, bool material, bool offset, int sign) {
        if (gauge && sign > 0) {
            ++gauges;
            return false;
        }
        if (!material || offset || sign > 0)
            return true;
        ++moduli;
        return false;
    };
    const auto shape = [](const compact_dimension& dim) {
        return dim.is_dimensionless() || dim == length_dimension() || dim == area_dimension() ||
               dim == volume_dim;
    };
    const bool other = for_each_factor(product, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number || n.kind == expr_kind::pi)
            return false;
        if (n.kind == expr_kind::reference) {
            const syntax::reference_value& r = file_.references[n.lhs];
            if (!r.dim)
                return true;
            const compact_dimension dim(*r.dim);
            if (dim == pressure_dimension())
                return pressure(r.offset != nullptr && r.offset->scale == unit_scale::gauge,
                                r.stress, r.offset != nullptr, sign);
            return !shape(dim);
        }
        if (n.kind != expr_kind::symbol)
            return true;
        const std::string_view name = text(n.range);
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr || !e->checked_type || !e->checked_type->known)
            return true;
        const typed_term& t = *e->checked_type;
        if (t.dim == pressure_dimension()) {
            const bool material = name == "E" || name.starts_with("E_") ||
                                  names_a_stress(name, e->description) ||
                                  e->description.find("elastic") != std::string_view::npos ||
                                  e->description.find("SMYS") != std::string_view::npos ||
                                  e->description.find("yield") != std::string_view::npos;
            return pressure(t.offset != nullptr && t.offset->scale == unit_scale::gauge, material,
                            t.offset != nullptr, sign);
        }
        return !shape(t.dim);
    });
    return !other && gauges == 1 && moduli == 1;
}

// Whether a subtree holds a gauge pressure (a symbol or a workbook cell declared on one).
bool checker::holds_gauge(std::uint32_t node) const {
    return syntax::search_subtree(file_, node, [&](std::uint32_t, const syntax::expr_node& n) {
        switch (n.kind) {
        case expr_kind::symbol: {
            const symbol_entry* entry = symbols_.find(text(n.range));
            return entry != nullptr && entry->offset_unit != nullptr &&
                           entry->offset_unit->scale == unit_scale::gauge
                       ? search_step::found
                       : search_step::skip;
        }
        case expr_kind::reference: {
            const syntax::reference_value& r = file_.references[n.lhs];
            return r.offset != nullptr && r.offset->scale == unit_scale::gauge ? search_step::found
                                                                               : search_step::skip;
        }
        case expr_kind::call:
            return search_step::skip;
        default:
            return search_step::descend;
        }
    });
}

// "10^((t - 250)/z)" with t in °C: a sterilising process's lethal rate counts from 121.1 °C,
// which is 250 °F (common practice; the F0 value's reference), and the number typed beside the
// reading is on the other scale: the rate comes out some 10^13 times too small. Only in a
// formula with a power of 10 in it, the lethal rate's form.
void checker::report_lethality_reference_on_other_scale(std::uint32_t index) {
    const syntax::expr_node& n = file_.nodes[index];
    const bool number_first = file_.nodes[n.lhs].kind == expr_kind::number;
    const std::uint32_t number = number_first ? n.lhs : n.rhs;
    const std::uint32_t reading_node = number_first ? n.rhs : n.lhs;
    const double reference = written_number(file_.nodes[number].range);
    const bool fahrenheit_number = std::abs(reference - 250.0) <= 0.5;
    const bool celsius_number = std::abs(reference - 121.1) <= 0.15;
    if (!fahrenheit_number && !celsius_number)
        return;
    const syntax::expr_node& reading = file_.nodes[syntax::inside_brackets(file_, reading_node)];
    if (reading.kind != expr_kind::symbol)
        return;
    const symbol_entry* e = symbols_.find(text(reading.range));
    if (e == nullptr || e->offset_unit == nullptr ||
        !(e->compact_dim && *e->compact_dim == temperature_dimension()))
        return;
    const bool celsius_reading = is_celsius(e->offset_unit);
    const bool fahrenheit_reading = std::abs(e->offset_unit->factor - 5.0 / 9.0) < 1e-9;
    if (!(fahrenheit_number && celsius_reading) && !(celsius_number && fahrenheit_reading))
        return;
    const bool power_of_ten =
        current_ != nullptr &&
        syntax::search_formula(file_, *current_, [&](std::uint32_t, const syntax::expr_node& p) {
            return p.kind == expr_kind::power && file_.nodes[p.lhs].kind == expr_kind::number &&
                           written_number(file_.nodes[p.lhs].range) == 10.0
                       ? search_step::found
                       : search_step::descend;
        });
    if (!power_of_ten)
        return;
    diagnostic& d = report(
        rules::offset_scale,
        fmt::format("{} stands beside {}, a reading in {}, but {} is the lethal rate's reference "
                    "in {} (121.1 \u00B0C is 250 \u00B0F): the difference in the exponent is "
                    "off by 128.9 {}",
                    display_text(file_.nodes[number].range), quote(reading_node),
                    e->offset_unit->symbol, display_text(file_.nodes[number].range),
                    fahrenheit_number ? "\u00B0F" : "\u00B0C", e->offset_unit->symbol),
        file_.nodes[number].range);
    d.level = severity::warning;
    d.notes.push_back({fahrenheit_number
                           ? "write 121.1 beside a °C reading, or the reference with its unit "
                             "(250 {°F}) and a reading in °F"
                           : "write 250 beside a °F reading, or the reference with its unit "
                             "(121.1 {°C}) and a reading in °C",
                       {}});
}

} // namespace plumb::formula_check
