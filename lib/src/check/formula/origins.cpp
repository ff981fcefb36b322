// The origins of a formula's sides: a reading on one scale set equal to another's (°C to
// K, gauge to absolute), an atmosphere added in another unit.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

bool checker::celsius_reading(const operand& o) {
    return o.type.known && o.type.point && o.type.offset != nullptr &&
           o.type.dim == temperature_dimension() && std::abs(o.type.offset->offset - 273.15) < 1e-9;
}

// "t_dp = 243.04 {Δ°C}*γ/(17.625 - γ)": the Magnus fit solved for the temperature (the dew
// point from γ = ln φ + 17.625·t/(243.04 + t), Alduchov and Eskridge 1996, from memory)
// gives a reading on the °C scale the fit was made on, though its form is a difference
// times a ratio. Known by its constants: b from 235 to 260 °C and a from 17 to 18 over
// water, and over ice b = 272.62 °C with a = 22.46 (WMO-No. 8, 2008, Annex 4.B, from memory).
bool checker::magnus_solved_for_reading(const operand& o) const {
    return o.type.known && !o.type.point && o.type.dim == temperature_dimension() &&
           magnus_solved_constant(o.node) != syntax::no_index;
}

// The constant b of the Magnus fit solved for the temperature, b·γ/(a - γ): a quantity (in the
// notation) or a number (in a workbook, "=243.04*LN(C5/6.1094)/(17.625-LN(C5/6.1094))") in
// the ranges above, over a difference led by a. Its node, or none.
std::uint32_t checker::magnus_solved_constant(std::uint32_t node) const {
    std::uint32_t b = syntax::no_index;
    bool a_over = false;
    const bool other = for_each_factor(node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if ((n.kind == expr_kind::quantity || n.kind == expr_kind::number) && sign > 0) {
            const double v =
                n.kind == expr_kind::quantity ? quantity_si_value(n) : written_number(n.range);
            if ((v >= 235.0 && v <= 260.0) || (v >= 270.0 && v <= 275.0))
                b = at;
            return false;
        }
        if ((n.kind == expr_kind::add || n.kind == expr_kind::subtract) && sign < 0) {
            const std::uint32_t first = syntax::inside_brackets(file_, n.lhs);
            if (n.kind == expr_kind::subtract && file_.nodes[first].kind == expr_kind::number) {
                const double a = written_number(file_.nodes[first].range);
                a_over = a_over || (a >= 17.0 && a <= 18.0) || (a >= 22.0 && a <= 23.0);
            }
            return false;
        }
        return n.kind != expr_kind::symbol && n.kind != expr_kind::number &&
               n.kind != expr_kind::call && n.kind != expr_kind::reference;
    });
    return !other && a_over ? b : syntax::no_index;
}

// "T_K = T_C": readings on scales with different zeros set equal or compared.
// `relation`: "equation", "limit" or "lookup", as the finding names what it is in.
// "T_F = (T_C - 32)/1.8": the °F-to-°C conversion applied to a °C reading to give one in °F,
// the conversion run the wrong way (and "T_C = 1.8*T_F + 32" the other way round). Read
// where one side is a reading and the other holds one reading and the number 32.
bool checker::explain_reversed_fahrenheit(diagnostic& d, const operand& a, const operand& b) {
    const auto scale_of = [&](std::string_view name) -> int {
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr || e->offset_unit == nullptr || !e->compact_dim ||
            !(*e->compact_dim == temperature_dimension()))
            return 0;
        if (std::abs(e->offset_unit->factor - 1.0) < 1e-12)
            return 1;                                                       // the Celsius scale
        return std::abs(e->offset_unit->factor * 1.8 - 1.0) < 1e-9 ? 2 : 0; // Fahrenheit
    };
    for (const auto& [target, conversion] : {std::pair{&a, &b}, std::pair{&b, &a}}) {
        const syntax::expr_node& t = file_.nodes[syntax::inside_brackets(file_, target->node)];
        if (t.kind != expr_kind::symbol)
            continue;
        const int target_scale = scale_of(text(t.range));
        std::string_view reading;
        int symbols = 0;
        bool less_32 = false;
        bool plus_32 = false;
        syntax::search_subtree(
            file_, conversion->node, [&](std::uint32_t, const syntax::expr_node& n) {
                if (n.kind == expr_kind::symbol) {
                    reading = text(n.range);
                    ++symbols;
                } else if ((n.kind == expr_kind::subtract || n.kind == expr_kind::add) &&
                           file_.nodes[n.rhs].kind == expr_kind::number &&
                           written_number(file_.nodes[n.rhs].range) == 32.0) {
                    (n.kind == expr_kind::subtract ? less_32 : plus_32) = true;
                }
                return search_step::descend;
            });
        if (symbols != 1 || target_scale == 0)
            continue;
        const int reading_scale = scale_of(reading);
        const std::string_view target_name = text(t.range);
        // Wanting °F from a °C reading with (t - 32)/1.8, or °C from a °F one with 1.8*t + 32.
        const bool wants_fahrenheit = less_32 && reading_scale == 1 && target_scale == 2;
        if (wants_fahrenheit || (plus_32 && reading_scale == 2 && target_scale == 1)) {
            const auto form = [&](bool to_fahrenheit) {
                return to_fahrenheit ? fmt::format("1.8*{} + 32", reading)
                                     : fmt::format("({} - 32)/1.8", reading);
            };
            const char* has = wants_fahrenheit ? "°C" : "°F";
            const char* wants = wants_fahrenheit ? "°F" : "°C";
            d.notes.push_back({fmt::format("{} turns a {} reading into {}, but '{}' is in {} "
                                           "already and '{}' wants {}: the conversion runs "
                                           "the other way, {} = {}",
                                           form(!wants_fahrenheit), wants, has, reading, has,
                                           target_name, wants, target_name, form(wants_fahrenheit)),
                               {}});
            return true;
        }
    }
    return false;
}

void checker::compare_origins(std::span<const operand> sides, std::string_view relation) {
    if (report_scale_zero_beside_difference(sides))
        return;
    for (const auto& side : sides)
        if (side.type.known && side.type.point && side.type.weighted_sum &&
            std::abs(side.type.origin) > 1e-9 + (std::isfinite(side.type.origin_tolerance)
                                                     ? side.type.origin_tolerance
                                                     : 0.0)) {
            report_unbalanced_readings(side);
            return;
        }
    if (std::all_of(sides.begin(), sides.end(),
                    [](const operand& side) { return side.type.origin == 0.0; }))
        return;
    const operand* reference = nullptr;
    for (const auto& side : sides) {
        if (!side.type.known || side.type.zero || side.type.numeric ||
            !std::isfinite(reading_tolerance(side.type)))
            continue;
        if (reference == nullptr) {
            reference = &side;
            continue;
        }
        const double slack = reading_tolerance(side.type) + reading_tolerance(reference->type) +
                             1e-9 * (std::abs(side.type.origin) + 1.0);
        const double difference = side.type.origin - reference->type.origin;
        if (std::abs(difference) <= slack)
            continue;
        // "p_g = p_abs - p_atm": a gauge reads the difference from the atmosphere.
        const auto on_gauge = [](const operand& o) {
            return o.type.offset != nullptr && o.type.offset->scale == unit_scale::gauge;
        };
        // "P_d = 2*S*t/D": a stress times the shape of a wall is a net pressure too; and
        // "p_w = 100*F/A_p", a cylinder's load over its bore, the gauge reading that holds
        // it with the other side at the atmosphere.
        // And "FG*TVD", a gradient times a depth: the column's pressure, as 0.052*MW*TVD
        // is (a fracture gradient from a leak-off test is gauge-based; Bourgoyne et al.,
        // Applied Drilling Engineering, 1986, ch. 6, from memory).
        // And "p_gr <= σ_v", a grout pressure against the overburden: a stress is counted
        // from the atmosphere, as soil mechanics counts it (σ_v = γ·z is zero at the ground).
        // And a column of water, a symbol or a cell in inH2O or ftH2O, which gauges and drops
        // are read in and an absolute pressure never is (common practice).
        // Converted by numbers ("=C21*2.491" into mbar(g)) it is one still.
        const auto water_column = [&](const operand& o) {
            if (o.type.offset != nullptr || !(o.type.dim == pressure_dimension()))
                return false;
            const std::uint32_t sole = sole_symbol_times_conversions(o.node, true);
            if (sole == syntax::no_index)
                return false;
            const syntax::expr_node& n = file_.nodes[sole];
            double scale = 0.0;
            if (n.kind == expr_kind::reference) {
                scale = file_.references[n.lhs].scale;
            } else if (const symbol_entry* e = symbols_.find(text(n.range)); e != nullptr) {
                scale = e->si_factor;
            }
            return is_water_column(scale);
        };
        // "σ_v/100" beside bar(g): a stress converted by numbers is a stress still.
        const auto stress_converted = [&](std::uint32_t node) {
            const std::uint32_t sole = sole_symbol_times_conversions(node, true);
            return sole != syntax::no_index && sole != node && names_a_stress_symbol(sole);
        };
        const auto net_pressure = [&](const operand& o) {
            return o.type.absolute_pressure_difference || declared_pressure_difference(o) ||
                   water_column(o) ||
                   (!o.type.point && o.type.dim == pressure_dimension() &&
                    (pressure_scaled_by_shape(o.node, false) || force_over_area(o.node) ||
                     gradient_times_depth(o.node) || names_a_stress_symbol(o.node) ||
                     stress_converted(o.node)));
        };
        if ((on_gauge(*reference) && net_pressure(side)) ||
            (on_gauge(side) && net_pressure(*reference)))
            continue;
        // "H_R = p_s - 20" with H_R a drop, "dT = t_op - 20": a reading less a bare number
        // set equal to a difference reads the number on the reading's own scale.
        const auto reading_less_a_number = [](const operand& o) {
            return o.type.point && o.type.reading_or_difference && o.type.offset != nullptr;
        };
        const auto a_difference = [](const operand& o) {
            return !o.type.point && !o.type.numeric && o.type.offset == nullptr &&
                   o.type.origin == 0.0;
        };
        if ((reading_less_a_number(*reference) && a_difference(side)) ||
            (reading_less_a_number(side) && a_difference(*reference)))
            continue;
        // "Δp_max = 0.05*p_O2": a share of a gauge pressure, the rise above the atmosphere,
        // set equal to a quantity declared a difference.
        const auto share_of_gauge = [&](const operand& o) {
            return on_gauge(o) && o.type.weight_denominator != 0 &&
                   !(o.type.weight_numerator == 1 && o.type.weight_denominator == 1);
        };
        if ((share_of_gauge(*reference) && a_difference(side)) ||
            (share_of_gauge(side) && a_difference(*reference)))
            continue;
        if ((celsius_reading(*reference) && magnus_solved_for_reading(side)) ||
            (celsius_reading(side) && magnus_solved_for_reading(*reference)))
            continue;
        const operand& off = side.type.offset != nullptr ? side : *reference;
        const operand& other = &off == &side ? *reference : side;
        const unit_definition* unit = off.type.offset;
        const bool temperature = off.type.dim == temperature_dimension();
        if (!temperature && unit != nullptr && unit->scale == unit_scale::gauge &&
            other.type.offset == nullptr && other.type.point &&
            (read_local_atmosphere(off, other.type.scale) ||
             read_local_atmosphere_taken_off(other)))
            return;
        // "1.8*(t + 273.15)": kelvins times 1.8 are degrees Rankine, its numbers taken in.
        const double other_degree = unit_of_written_numbers(other.type);
        const std::string scale_of_other =
            other.type.offset != nullptr
                ? fmt::format("the {} scale", other.type.offset->symbol)
                : std::string(!temperature ? "the absolute scale (Pa, bar, psia)"
                              // "(t_F - 32)/1.8 + 273.15": the numbers' degree, where they give
                              // one, is the kelvin; the °F reading's own only otherwise.
                              : (std::isfinite(other_degree)
                                     ? std::abs(other_degree * 1.8 - 1.0) < 1e-3
                                     : std::abs(other.type.scale * 1.8 - 1.0) < 1e-9)
                                  ? "the absolute scale (°R)"
                                  : "the absolute scale (K)");
        // "14.5*p_g + 14.7" moves the zero by 14.7 psi seen through the rounded 14.5: the
        // step is the atmosphere, and the stray digits would only puzzle.
        const bool one_atmosphere =
            !temperature && std::abs(std::abs(difference) / standard_atmosphere - 1.0) < 5e-3;
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} is on the {} scale but {} is on {}: the {} of this {} differ by {}",
                        quote(off.node), unit != nullptr ? unit->symbol : "offset",
                        quote(other.node), scale_of_other, "zeros", relation,
                        one_atmosphere ? fmt::format("one atmosphere ({} Pa)",
                                                     format_factor(standard_atmosphere))
                                       : fmt::format("{} {}", format_factor(std::abs(difference)),
                                                     temperature ? "K" : "Pa")),
            file_.nodes[off.node].range);
        add_term(d, off);
        add_term(d, other);
        // The zeros' difference seen through a conversion run backwards would only puzzle:
        // what went wrong becomes the finding's headline.
        if (temperature && explain_reversed_fahrenheit(d, side, *reference)) {
            d.message = std::move(d.notes.back().message);
            d.notes.pop_back();
            return;
        }
        if (unit != nullptr && other.type.offset == nullptr) {
            // "T_K = T_F + 273.15": where a number is added already, it is the wrong one;
            // the advice names the reading, not the whole side with that number in it.
            const expr_kind kind = file_.nodes[off.node].kind;
            // The side as written, brackets stripped: a sum or a number times a reading.
            const syntax::expr_node& whole = file_.nodes[syntax::inside_brackets(file_, off.node)];
            const bool has_number =
                (kind == expr_kind::add || kind == expr_kind::subtract) &&
                (file_.nodes[syntax::inside_brackets(file_, whole.lhs)].kind == expr_kind::number ||
                 file_.nodes[syntax::inside_brackets(file_, whole.rhs)].kind == expr_kind::number);
            std::string reading =
                has_number ? std::string("the reading") : display_text(file_.nodes[off.node].range);
            // "T_ev = t_evF/1.8": the reading alone takes the zero; its degree's 1.8 beside
            // it would only be divided in twice.
            if (temperature && !has_number &&
                file_.nodes[syntax::inside_brackets(file_, off.node)].kind != expr_kind::symbol) {
                std::uint32_t lone = syntax::no_index;
                const bool other = for_each_factor(off.node, [&](std::uint32_t at, int sign) {
                    const expr_kind k = file_.nodes[at].kind;
                    if (k == expr_kind::symbol && sign > 0 && lone == syntax::no_index) {
                        lone = at;
                        return false;
                    }
                    return k != expr_kind::number;
                });
                if (!other && lone != syntax::no_index)
                    reading = display_text(file_.nodes[lone].range);
            }
            // "p_0 = 0.9*p_1": a ratio times a gauge reading. An allowance on a set pressure
            // (1.1 × p_set, API 520) is taken of the gauge reading, and the atmosphere added
            // after it; a ratio of absolute pressures (an accumulator's precharge at 0.9 of
            // the lowest working pressure, from the gas law) takes the atmosphere inside.
            std::string ratio_of_reading;
            if (!temperature && whole.kind == expr_kind::multiply &&
                file_.nodes[whole.lhs].kind == expr_kind::number &&
                file_.nodes[whole.rhs].kind == expr_kind::symbol) {
                const double factor = written_number(file_.nodes[whole.lhs].range);
                if (factor >= 0.5 && factor < 1.0)
                    ratio_of_reading = fmt::format(
                        "; where {} is a ratio of absolute pressures (a gas's precharge), write "
                        "{}*({} + the atmospheric pressure) instead",
                        text(file_.nodes[whole.lhs].range), text(file_.nodes[whole.lhs].range),
                        text(file_.nodes[whole.rhs].range));
            }
            std::string zero = format_factor(unit->offset / unit->factor);
            const auto [written_unit, absolute_unit] = unit_of_numbers(off.type, *unit);
            if (!temperature && absolute_unit != absolute_symbol(*unit))
                zero = format_factor(standard_atmosphere / written_unit);
            // A degree the size of the kelvin reads in kelvins from its zero; the °F's in
            // degrees Rankine, which are 1.8 to the kelvin.
            const bool kelvin_sized = std::abs(unit->factor - 1.0) < 1e-12;
            std::string advice =
                temperature
                    ? (kelvin_sized
                           ? fmt::format("a {} reading plus {} is in kelvins: write ({} + {}) "
                                         "beside K, ({} + {})*1.8 beside °R",
                                         unit->symbol, zero, reading, zero, reading, zero)
                           : fmt::format("a {} reading plus {} is in degrees Rankine, and "
                                         "that divided by 1.8 in kelvins: write ({} + {}) "
                                         "beside °R, ({} + {})/1.8 beside K",
                                         unit->symbol, zero, reading, zero, reading, zero))
                    : site_atmosphere_advice(reading, written_unit, absolute_unit)
                          .value_or(fmt::format(
                              "a gauge reading plus the atmospheric pressure is absolute: "
                              "write ({} + {}), or ({} + {}) at sea level, the standard "
                              "atmosphere in {}",
                              reading, atmosphere_in(written_unit, absolute_unit), reading, zero,
                              absolute_unit));
            advice += ratio_of_reading;
            // "p_H2 = y_H2/100*p_rg": a fraction of a gauge reading, a partial pressure, is
            // that fraction of the absolute pressure (Dalton's law); the atmosphere goes
            // inside, not after the fraction has scaled the reading.
            if (const std::uint32_t share = fraction_of_a_reading(whole);
                !temperature && share != syntax::no_index) {
                const std::string fraction = display_text(file_.nodes[share].range);
                const std::string gauge =
                    display_text(file_.nodes[share == whole.lhs ? whole.rhs : whole.lhs].range);
                advice = fmt::format(
                    "a partial pressure (Dalton's law) is a share of the absolute pressure: "
                    "write {}*({} + {}), or {}*({} + {}) at sea level, the standard atmosphere "
                    "in {}",
                    fraction, gauge, atmosphere_in(written_unit, absolute_unit), fraction, gauge,
                    zero, absolute_unit);
            }
            // "t_C = (t_F - 32)/1.8 + 273.15": the kelvins' 273.15 added where the side is
            // on the °C scale (or °R's 459.67 beside °F) is the slip; the rest converts.
            if (temperature && unit != nullptr) {
                const syntax::expr_node& sum =
                    file_.nodes[syntax::inside_brackets(file_, other.node)];
                const bool celsius = std::abs(unit->factor - 1.0) < 1e-12;
                if (sum.kind == expr_kind::add && file_.nodes[sum.rhs].kind == expr_kind::number &&
                    std::abs(written_number(file_.nodes[sum.rhs].range) -
                             (celsius ? 273.15 : 459.67)) < 0.02)
                    advice = fmt::format("{} takes a reading to {}, but '{}' is on the {} scale: "
                                         "drop the {}",
                                         display_text(file_.nodes[sum.rhs].range),
                                         celsius ? "kelvins" : "degrees Rankine",
                                         display_text(file_.nodes[off.node].range), unit->symbol,
                                         display_text(file_.nodes[sum.rhs].range));
                // "t_F = t_C + 273.15", "=D9+273.15" into °F: the other scale's reading made
                // absolute; the conversion between the two scales is what was meant.
                else if (sum.kind == expr_kind::add &&
                         file_.nodes[sum.rhs].kind == expr_kind::number)
                    if (const unit_definition* from = offset_unit_of(sum.lhs);
                        from != nullptr && from != unit &&
                        std::abs(written_number(file_.nodes[sum.rhs].range) -
                                 (celsius ? 459.67 : 273.15)) < 0.02)
                        advice = fmt::format(
                            "{} takes a reading to {} from {}, but '{}' is on the {} scale: "
                            "write {}",
                            display_text(file_.nodes[sum.rhs].range),
                            celsius ? "degrees Rankine" : "kelvins", from->symbol,
                            display_text(file_.nodes[off.node].range), unit->symbol,
                            celsius ? fmt::format("({} - 32)/1.8",
                                                  display_text(file_.nodes[sum.lhs].range))
                                    : fmt::format("{}*1.8 + 32",
                                                  display_text(file_.nodes[sum.lhs].range)));
            }
            // "Δθ_h = θ_h" with Δθ_h in K "rise above ambient": the kelvins are a rise's,
            // and a reading made absolute would only hide the slip.
            if (temperature && file_.nodes[other.node].kind == expr_kind::symbol) {
                const std::string_view name = text(file_.nodes[other.node].range);
                const symbol_entry* e = symbols_.find(name);
                const std::string_view about = e != nullptr ? e->description : "";
                if (names_a_difference(name, about) || about.find("rise") != std::string_view::npos)
                    advice = fmt::format("'{}' is a rise, the difference of two readings: "
                                         "write it as one, such as ({} - T_ref), not as the "
                                         "reading made absolute",
                                         name, reading);
            }
            // "u_e = u_g - γ_w*h_w": a gauge reading less a column's pressure is a gauge
            // reading; where the column stands for a second reading (the hydrostatic pore
            // pressure), the difference of the two is on no scale.
            const std::uint32_t taken = whole.kind == expr_kind::subtract
                                            ? syntax::inside_brackets(file_, whole.rhs)
                                            : syntax::no_index;
            if (!temperature && taken != syntax::no_index &&
                file_.nodes[taken].kind != expr_kind::number &&
                file_.nodes[taken].kind != expr_kind::symbol &&
                file_.nodes[taken].kind != expr_kind::quantity) {
                d.notes.push_back(
                    {fmt::format("{} is taken as a pressure difference, a column's, so the sum "
                                 "is still a gauge reading; where it stands for a second gauge "
                                 "reading (a hydrostatic pressure), declare that reading in {} "
                                 "and subtract it: two gauge readings differ by an ordinary "
                                 "pressure",
                                 quote(taken), unit->symbol),
                     {}});
            }
            if (has_number) {
                advice = fmt::format("the number added does not put the zero where the other "
                                     "side has it; {}{}",
                                     atmosphere_in_other_unit(off, written_unit), advice);
                if (std::optional<std::string> in_unit_of_other =
                        atmosphere_in_unit_of_other(off, other, written_unit))
                    advice = std::move(*in_unit_of_other);
            }
            if (const std::optional<std::string> added =
                    atmosphere_added_to_gauge(other, off, temperature))
                advice = *added;
            d.notes.push_back({std::move(advice), {}});
        } else if (unit != nullptr && other.type.offset != nullptr && temperature) {
            // "T_C = T_F/1.8 - 32": the 32 taken after the division lands 32 - 32/1.8 K
            // from the reading, which is what the engineer needs to hear, not how far the
            // scales' zeros lie apart.
            for (const operand* o : {&off, &other})
                if (const std::optional<double> n = number_taken_after_division_by_1_8(*o)) {
                    const double off_by = 32.0 / 1.8 - *n;
                    d.message = fmt::format(
                        "{} takes {} away after dividing by 1.8: beside {} it is {} K too {}",
                        quote(o->node), format_factor(*n), quote((o == &off ? other : off).node),
                        format_factor(std::abs(off_by)), off_by < 0 ? "low" : "high");
                    break;
                }
            // "T_C = T_F/1.8 - 32", "T_F = 1.8*T_C": the conversion between the two
            // scales with its zero left out or put in the wrong place.
            d.notes.push_back({"a \u00B0F reading is (T_F - 32)/1.8 on the \u00B0C scale, "
                               "32 subtracted before dividing; a \u00B0C reading is "
                               "1.8*T_C + 32 on the \u00B0F scale",
                               {}});
        }
        return;
    }
}

// "t_F/1.8 - 32", "0.5556*t_F - 32" on the °F scale: the number taken after the degrees
// are divided to kelvin size; empty for any other side.
std::optional<double> checker::number_taken_after_division_by_1_8(const operand& o) const {
    if (o.type.offset == nullptr || std::abs(o.type.offset->factor * 1.8 - 1.0) > 1e-9)
        return std::nullopt;
    const syntax::expr_node& whole = file_.nodes[syntax::inside_brackets(file_, o.node)];
    if (whole.kind != expr_kind::subtract)
        return std::nullopt;
    const syntax::expr_node& taken = file_.nodes[syntax::inside_brackets(file_, whole.rhs)];
    const syntax::expr_node& scaled = file_.nodes[syntax::inside_brackets(file_, whole.lhs)];
    if (taken.kind != expr_kind::number ||
        (scaled.kind != expr_kind::divide && scaled.kind != expr_kind::multiply))
        return std::nullopt;
    const auto number_of = [&](std::uint32_t at) {
        const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, at)];
        return n.kind == expr_kind::number ? written_number(n.range) : 0.0;
    };
    const bool by_1_8 = scaled.kind == expr_kind::divide
                            ? std::abs(number_of(scaled.rhs) / 1.8 - 1.0) < 1e-3
                            : std::abs(number_of(scaled.lhs) * 1.8 - 1.0) < 1e-3 ||
                                  std::abs(number_of(scaled.rhs) * 1.8 - 1.0) < 1e-3;
    if (!by_1_8)
        return std::nullopt;
    return written_number(taken.range);
}

// "y_H2/100*p_rg", "x_CO2*p_g": the factor of a product of two that is a fraction (built of
// numbers and dimensionless symbols, one symbol at least) beside a symbol; no_index otherwise.
std::uint32_t checker::fraction_of_a_reading(const syntax::expr_node& product) const {
    if (product.kind != expr_kind::multiply)
        return syntax::no_index;
    const auto fraction = [&](std::uint32_t k) {
        bool symbol = false;
        const bool other = for_each_factor(k, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return false;
            const symbol_entry* e =
                n.kind == expr_kind::symbol ? symbols_.find(text(n.range)) : nullptr;
            if (e == nullptr || !e->compact_dim || !e->compact_dim->is_dimensionless())
                return true;
            symbol = true;
            return false;
        });
        return symbol && !other;
    };
    const auto symbol = [&](std::uint32_t k) {
        return file_.nodes[syntax::inside_brackets(file_, k)].kind == expr_kind::symbol;
    };
    if (symbol(product.rhs) && fraction(product.lhs))
        return product.lhs;
    if (symbol(product.lhs) && fraction(product.rhs))
        return product.rhs;
    return syntax::no_index;
}

// The number added to a side "reading + number", groups stripped; no_index otherwise.
std::uint32_t checker::number_added(std::uint32_t node) const {
    node = syntax::inside_brackets(file_, node);
    if (file_.nodes[node].kind != expr_kind::add)
        return syntax::no_index;
    const std::uint32_t rhs = syntax::inside_brackets(file_, file_.nodes[node].rhs);
    return file_.nodes[rhs].kind == expr_kind::number ? rhs : syntax::no_index;
}

// "p_0a = p_0g + 14.7" on a sheet in bar: the number is the atmosphere, in another unit.
std::string checker::atmosphere_in_other_unit(const operand& side, double reading_unit) const {
    const std::uint32_t number = number_added(side.node);
    if (number == syntax::no_index || !std::isfinite(reading_unit))
        return {};
    const std::string_view written = text(file_.nodes[number].range);
    const double value = read_number(written).literal.value;
    for (const auto& u : pressure_units)
        if (std::abs(reading_unit / u.pascals - 1.0) > 5e-3 &&
            read_reference_state(pressure_dimension(), value, written, u.pascals) != nullptr)
            return fmt::format("{} is the atmosphere in {}, not in the reading's unit; ", written,
                               u.name);
    return {};
}

// "p_wh = p_whb + 14.7" with p_wh in psia and p_whb in bar g: the atmosphere is typed in
// the other side's unit, and the reading needs that unit too, not only the zero.
std::optional<std::string> checker::atmosphere_in_unit_of_other(const operand& side,
                                                                const operand& other,
                                                                double reading_unit) const {
    const std::uint32_t number = number_added(side.node);
    if (number == syntax::no_index || !std::isfinite(reading_unit) ||
        !std::isfinite(other.type.scale) || other.type.literal_count != 0 ||
        std::abs(other.type.scale / reading_unit - 1.0) < 5e-3)
        return std::nullopt;
    const std::string_view written = text(file_.nodes[number].range);
    const double value = read_number(written).literal.value;
    for (const auto& u : pressure_units) {
        if (std::abs(other.type.scale / u.pascals - 1.0) > 5e-3 ||
            read_reference_state(pressure_dimension(), value, written, u.pascals) == nullptr)
            continue;
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, side.node)];
        return fmt::format("{} is the atmosphere in {}, the unit of {}, but the reading is "
                           "not in {}: convert it as well, ({}*{} + {})",
                           written, u.name, quote(other.node), u.name,
                           format_factor(reading_unit / u.pascals),
                           display_text(file_.nodes[sum.lhs].range), written);
    }
    return std::nullopt;
}

// "p_psig = 14.5*p_barg + 14.7": a gauge reading, converted, with the atmosphere added is
// absolute; the side it is set equal to is gauge, so the atmosphere is the slip.
std::optional<std::string> checker::atmosphere_added_to_gauge(const operand& absolute,
                                                              const operand& gauge,
                                                              bool temperature) const {
    const std::uint32_t number = number_added(absolute.node);
    if (temperature || number == syntax::no_index ||
        file_.nodes[syntax::inside_brackets(file_, gauge.node)].kind != expr_kind::symbol ||
        !holds_gauge(file_.nodes[syntax::inside_brackets(file_, absolute.node)].lhs))
        return std::nullopt;
    const std::string written = display_text(file_.nodes[number].range);
    return fmt::format("{} adds {}, the atmosphere, to a gauge reading, which makes it "
                       "absolute, while {} is gauge: drop the {}, or declare {} absolute",
                       quote(absolute.node), written, display_text(file_.nodes[gauge.node].range),
                       written, display_text(file_.nodes[gauge.node].range));
}

// "p_abs = p_max + 92.1" in kPa, "p_a = p_g + 1" in bar: a number added to a gauge reading
// that falls short of the standard atmosphere by no more than the air above the highest
// sites does (5200 m, see declared_site_barometer) is the site's barometer, or a rounded
// one; a note says which height it stands for.
bool checker::read_local_atmosphere(const operand& sum, double other_scale) {
    std::uint32_t k = sum.node;
    k = syntax::inside_brackets(file_, k);
    if (!std::isfinite(sum.type.scale))
        return false;
    // Beside the gauge symbol alone, the number is in the symbol's unit; "14.5*(p_g + 0.975)"
    // converts the sum, number and all. Beside the reading converted by numbers into the
    // other side's unit ("100*p_g + 97.5" with p_g in barg and the side in kPa), it is in
    // that unit: in 6.895*p_g + 14.7 into kPa, 14.7 kPa is no atmosphere.
    std::uint32_t number = syntax::no_index;
    double unit = sum.type.scale;
    // The gauge symbol among a product's factors and the numbers beside it, which must take
    // the reading into the other side's unit within their rounding (14.5 psi per bar is
    // 14.5038); `inner` is a bracketed sum of the symbol and a number, where one is.
    const auto converted_reading = [&](std::uint32_t product, std::uint32_t& inner) {
        std::optional<double> reading;
        double numbers = 1.0;
        double rounding = 1e-9;
        const bool other = for_each_factor(product, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number) {
                const double v = written_number(n.range);
                if (!(v > 0.0))
                    return true;
                numbers *= sign > 0 ? v : 1.0 / v;
                rounding += read_literal(text(n.range), v, at).tolerance;
                return false;
            }
            if (sign < 0 || reading)
                return true;
            std::uint32_t symbol = at;
            if (n.kind != expr_kind::symbol && n.kind != expr_kind::reference) {
                const auto parts = number_beside_symbol(at, true);
                if (!parts)
                    return true;
                inner = at;
                symbol = parts->second;
            }
            reading = gauge_reading_unit(symbol);
            return !reading;
        });
        return !other && reading && std::isfinite(other_scale) && other_scale > 0.0 &&
                       std::abs(*reading / numbers / other_scale - 1.0) <= rounding
                   ? reading
                   : std::nullopt;
    };
    if (const auto parts = number_beside_symbol(k, true)) {
        number = parts->first;
    } else if (file_.nodes[k].kind == expr_kind::multiply) {
        std::uint32_t inner = syntax::no_index;
        const std::optional<double> reading = converted_reading(k, inner);
        if (!reading || inner == syntax::no_index)
            return false;
        number = number_beside_symbol(inner, true)->first;
        unit = *reading;
    } else if (file_.nodes[k].kind == expr_kind::add) {
        const syntax::expr_node& n = file_.nodes[k];
        const bool left_number = file_.nodes[n.lhs].kind == expr_kind::number;
        const std::uint32_t written = left_number ? n.lhs : n.rhs;
        std::uint32_t inner = syntax::no_index;
        if (file_.nodes[written].kind != expr_kind::number ||
            !converted_reading(left_number ? n.rhs : n.lhs, inner) || inner != syntax::no_index)
            return false;
        number = written;
        unit = other_scale;
    } else {
        return false;
    }
    return read_number_as_local_atmosphere(number, unit);
}

// "(p_g + 99.8 - p_v)" in NPSHa, "p_g + 1.0 + ρ*g*h": a gauge reading among other terms with
// one number added where the standard atmosphere would put the sum's zero at the absolute one;
// or a gauge reading and the number alone inside a side, "(p_1g + 1.009)/(p_2g + 1.009)" in
// Boyle's law. The number is the site's barometer, as it is beside a gauge reading set equal
// to an absolute pressure (above).
bool checker::read_site_atmosphere_in_sum(std::span<const operand> terms, double unit,
                                          double shifted_origin, double tolerance) {
    const operand* number = nullptr;
    for (const auto& t : terms) {
        if (!is_shift_candidate(t))
            continue;
        if (number != nullptr || t.subtracted || !t.type.numeric ||
            file_.nodes[t.node].kind != expr_kind::number)
            return false;
        number = &t;
    }
    if (number == nullptr || !std::isfinite(unit))
        return false;
    const double added = shift_of(*number).written * unit;
    return std::abs(shifted_origin + added - standard_atmosphere) <=
               tolerance + 3e-4 * standard_atmosphere &&
           read_number_as_local_atmosphere(number->node, unit);
}

// The SI value of one unit of a reading on an offset scale (psig, barg): a symbol declared in
// one, or a workbook's cell with one written beside it.
std::optional<double> checker::gauge_reading_unit(std::uint32_t node) const {
    const syntax::expr_node& n = file_.nodes[node];
    if (n.kind == expr_kind::symbol) {
        if (const symbol_entry* e = symbols_.find(text(n.range)); e != nullptr && e->offset_unit)
            return e->si_factor;
    } else if (n.kind == expr_kind::reference) {
        if (const syntax::reference_value& cell = file_.references[n.lhs]; cell.offset != nullptr)
            return cell.scale;
    }
    return std::nullopt;
}

// "p_psig = p_sa - 14.2", "p_k/6.895 - 14.2" into psig: an absolute reading, or one converted
// by its factor into a unit of pressure, less the site's atmosphere is a gauge reading there,
// as a gauge reading plus it is absolute.
bool checker::read_local_atmosphere_taken_off(const operand& difference) {
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, difference.node)];
    if (n.kind != expr_kind::subtract || file_.nodes[n.rhs].kind != expr_kind::number)
        return false;
    const symbol_entry* reading = nullptr;
    double numbers = 1.0;
    const bool other = for_each_factor(n.lhs, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& f = file_.nodes[at];
        if (f.kind == expr_kind::number) {
            const double v = written_number(f.range);
            if (!(v > 0.0))
                return true;
            numbers *= sign > 0 ? v : 1.0 / v;
            return false;
        }
        if (f.kind != expr_kind::symbol || sign < 0 || reading != nullptr)
            return true;
        reading = symbols_.find(text(f.range));
        return reading == nullptr || reading->offset_unit != nullptr || !reading->compact_dim ||
               !(*reading->compact_dim == pressure_dimension());
    });
    if (other || reading == nullptr)
        return false;
    const double converted = reading->si_factor / numbers;
    const auto named =
        std::find_if(pressure_units.begin(), pressure_units.end(), [&](const pressure_unit& u) {
            return std::abs(converted / u.pascals - 1.0) < 0.005;
        });
    if (named == pressure_units.end())
        return false;
    return read_number_as_local_atmosphere(n.rhs, named->pascals);
}

// A number, in `unit`, read as the atmosphere where a gauge is: a note where it is an
// atmosphere some way above sea level, a finding where the file declares another barometer.
bool checker::read_number_as_local_atmosphere(std::uint32_t number, double unit) {
    const double pressure = written_number(file_.nodes[number].range) * unit;
    if (!(pressure >= highest_site_atmosphere * standard_atmosphere &&
          pressure <= deepest_site_atmosphere * standard_atmosphere))
        return false;
    const site_barometer* site = declared_site_barometer();
    // Above the sea level's, only as the barometer a file declares down its mine.
    if (pressure > 1.005 * standard_atmosphere &&
        (site == nullptr || std::abs(pressure / site->pascals - 1.0) > site_barometer_slack))
        return false;
    // "p_g + 14.73" where the file declares a barometer of 96.9 kPa: 14.73 psia, the US gas
    // contract's base pressure, taken for the site's atmosphere.
    if (site != nullptr && std::abs(pressure / site->pascals - 1.0) > site_barometer_slack) {
        report_atmosphere_not_the_site(
            number, fmt::format("an atmosphere of {} kPa", format_factor(pressure / 1000.0)),
            pressure, *site, unit);
        return true;
    }
    // The barometric formula of the standard atmosphere, h = 44330.8·(1 - (p/p0)^0.190263) m.
    const double height = 44330.8 * (1.0 - std::pow(pressure / standard_atmosphere, 0.190263));
    diagnostic& d = report(
        rules::trade_constant,
        fmt::format("{} is read as the atmospheric pressure where the gauge is, {} kPa, which "
                    "the standard atmosphere has about {} m {} sea level",
                    display_text(file_.nodes[number].range), format_factor(pressure / 1000.0),
                    static_cast<long>(std::round(std::abs(height) / 10.0) * 10),
                    height >= 0.0 ? "above" : "below"),
        file_.nodes[number].range);
    d.level = severity::note;
    d.notes.push_back({"a gauge reading plus the local atmosphere is absolute; at sea level "
                       "the standard atmosphere is 101.325 kPa (14.696 psi, 1.01325 bar)",
                       {}});
    return true;
}

// "SSD_ft = 1.47*V_mph*t + 1.075*V_mph^2/a": a side whose terms agree only through
// rounded factors (1.47 for 1.4667) takes the unit those factors round, where the other
// side's unit lies within their rounding, rather than the first one's 0.2 % off.
void checker::settle_rounded_side(typed_term& side, std::size_t literal_base) const {
    if (side_hint_ == nullptr || !side_hint_->known || !side.known ||
        !(side_hint_->dim == side.dim) || !std::isfinite(side.scale) ||
        !std::isfinite(side_hint_->scale) || side_hint_->scale <= 0.0)
        return;
    double rounding = 0.0;
    for (std::size_t l = literal_base; l < literals_.size(); ++l)
        if (literals_[l].exponent != 0.0)
            rounding = std::max(rounding, literals_[l].tolerance * std::abs(literals_[l].exponent));
    if (rounding > 0.0 && std::abs(side.scale / side_hint_->scale - 1.0) <= rounding) {
        side.scale = side_hint_->scale;
        side.exact_scale = side_hint_->exact_scale;
    }
}

// "T_m = T_hi + T_ho", "t_film = T_s + T_a/2": readings on a scale with an arbitrary zero
// added with weights that make neither one reading (they sum to 1) nor a difference (0).
void checker::report_unbalanced_readings(const operand& side) {
    const std::optional<rational> w = weight_of(side.type);
    const unit_definition* scale = side.type.offset;
    diagnostic& d =
        report(rules::offset_scale,
               fmt::format("{} adds readings on the {} scale with weights that sum to {}, not 1: "
                           "its value depends on where the scale's zero is",
                           quote(side.node), scale != nullptr ? scale->symbol : "offset",
                           w ? (w->is_integer() ? fmt::format("{}", w->num())
                                                : fmt::format("{}/{}", w->num(), w->den()))
                             : std::string("another number")),
               file_.nodes[side.node].range);
    add_term(d, side);
    d.notes.push_back({"a mean of two readings is (T_1 + T_2)/2, weights 1/2 and 1/2; a "
                       "difference is T_1 - T_2, weights 1 and -1",
                       {}});
}

// "dp = p_abs - p_g": the right side is the atmosphere, a reading, not a difference.
bool checker::report_scale_zero_beside_difference(std::span<const operand> sides) {
    for (const auto& zero : sides) {
        if (!zero.type.known || zero.type.zero_of == nullptr)
            continue;
        for (const auto& other : sides) {
            if (&other == &zero || !other.type.known || other.type.zero || other.type.numeric ||
                other.type.point)
                continue;
            const unit_definition& scale = *zero.type.zero_of;
            diagnostic& d =
                report(rules::offset_scale,
                       fmt::format("{} is the zero of the {} scale ({} {}) as a reading on the "
                                   "absolute scale, but {} is a difference",
                                   quote(zero.node), scale.symbol, format_factor(scale.offset),
                                   zero.type.dim == temperature_dimension() ? "K" : "Pa",
                                   quote(other.node)),
                       file_.nodes[zero.node].range);
            add_term(d, zero);
            add_term(d, other);
            d.notes.push_back(
                {scale.scale == unit_scale::gauge
                     ? std::string("an absolute pressure less a gauge reading of it is the "
                                   "atmospheric pressure; a gauge reading is the absolute "
                                   "pressure less the atmosphere's (p_abs - p_atm)")
                     : fmt::format("a kelvin reading less a {} reading of it is the {} "
                                   "scale's zero; a difference needs two readings on one "
                                   "scale",
                                   scale.symbol, scale.symbol),
                 {}});
            return true;
        }
    }
    return false;
}

// The SI value of the unit a term's numbers are in once its own numbers are taken as
// conversions: kPa for 6.895*p_g with p_g in psig, °R for 1.8*(t + 273.15).
double checker::unit_of_written_numbers(const typed_term& t) const {
    double unit = t.scale;
    for (std::uint32_t l = 0; l < t.literal_count; ++l) {
        const scale_literal& number = literals_[t.literal_begin + l];
        unit /= std::pow(number.value, number.exponent);
    }
    return unit;
}

// "p_kPa = 6.895*p_g": the unit the numbers of a gauge reading's expression are in by then
// (kPa), which an atmosphere added to them must be in too, with its name; its numbers are
// taken as rounded conversions (14.5 psi per bar is 14.5038). The scale's own unit where they
// convert to none of the pressure units calcs write.
std::pair<double, std::string> checker::unit_of_numbers(const typed_term& t,
                                                        const unit_definition& scale) const {
    const double written_unit = unit_of_written_numbers(t);
    if (std::isfinite(written_unit) && std::abs(written_unit / scale.factor - 1.0) > 1e-3 &&
        scale.dim() == pressure_dimension().expand()) {
        for (const auto& u : pressure_units)
            if (std::abs(written_unit / u.pascals - 1.0) < 5e-3)
                return {u.pascals, std::string(u.name)};
        // "0.10*p_set_psig": a share of the reading, no conversion into a unit of pressure;
        // the atmosphere to add is in the reading's own unit, not a tenth of it.
        if (std::isfinite(t.scale) && t.scale > 0.0)
            return {t.scale, absolute_symbol(scale)};
    }
    return {written_unit, absolute_symbol(scale)};
}

// "'D' is in mm, 'Q' in L/s": the symbols under a node declared in non-coherent units.
std::string checker::units_in(std::uint32_t root) const {
    std::string out;
    // "OB/100*Q_r" with OB in % and Q_r in kg: were only the percentage named, the kilograms
    // that make the term's unit would be missing; coherent units are named then too.
    std::string coherent;
    bool only_pure_numbers = true;
    std::vector<std::uint32_t> stack{root};
    std::size_t listed = 0;
    while (!stack.empty() && listed < 6) {
        const syntax::expr_node& n = file_.nodes[stack.back()];
        stack.pop_back();
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e != nullptr && !e->unit_text.empty() && std::abs(e->si_factor - 1.0) > 1e-12 &&
                out.find(fmt::format("'{}'", text(n.range))) == std::string::npos) {
                out += fmt::format("{}'{}' is in {}", out.empty() ? "" : ", ", text(n.range),
                                   e->unit_text);
                only_pure_numbers = only_pure_numbers && e->dim && e->dim->is_dimensionless();
                ++listed;
            } else if (e != nullptr && !e->unit_text.empty() && e->dim &&
                       !e->dim->is_dimensionless() && coherent.size() < 120 &&
                       coherent.find(fmt::format("'{}'", text(n.range))) == std::string::npos) {
                coherent += fmt::format(", '{}' is in {}", text(n.range), e->unit_text);
            }
        } else if (n.kind == expr_kind::call) {
            for (std::uint32_t i = 0; i < n.rhs; ++i)
                stack.push_back(file_.call_args[n.lhs + i]);
        } else if (n.kind != expr_kind::number && n.kind != expr_kind::pi &&
                   n.kind != expr_kind::quantity && n.kind != expr_kind::inferred &&
                   n.kind != expr_kind::reference) {
            if (n.rhs != syntax::no_index)
                stack.push_back(n.rhs);
            if (n.lhs != syntax::no_index)
                stack.push_back(n.lhs);
        }
    }
    if (!out.empty() && only_pure_numbers)
        out += coherent;
    return out;
}

// "D_omm*(1 - ν^2)/(E_s*t_w)" with the diameter in mm and the wall in in: symbols of one
// dimension declared in units of different sizes meet in one product, so a term that holds
// them is more likely the one left unconverted than a term of one symbol beside it.
bool checker::mixes_units_of_one_kind(std::uint32_t root) const {
    std::array<const symbol_entry*, 8> seen{};
    std::size_t count = 0;
    std::vector<std::uint32_t> stack{root};
    while (!stack.empty() && count < seen.size()) {
        const syntax::expr_node& n = file_.nodes[stack.back()];
        stack.pop_back();
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || e->compact_dim->is_dimensionless() ||
                e->offset_unit != nullptr)
                continue;
            for (std::size_t i = 0; i < count; ++i)
                if (*seen[i]->compact_dim == *e->compact_dim &&
                    std::abs(seen[i]->si_factor / e->si_factor - 1.0) > 1e-9)
                    return true;
            seen[count++] = e;
        } else if (n.kind == expr_kind::multiply || n.kind == expr_kind::divide ||
                   n.kind == expr_kind::group || n.kind == expr_kind::power ||
                   n.kind == expr_kind::negate) {
            stack.push_back(n.lhs);
            if (n.kind == expr_kind::multiply || n.kind == expr_kind::divide)
                stack.push_back(n.rhs);
        }
    }
    return false;
}

// The offset scale a reading is declared on: a symbol's unit or a workbook cell's.
const unit_definition* checker::offset_unit_of(std::uint32_t node) const {
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, node)];
    if (n.kind == expr_kind::reference)
        return file_.references[n.lhs].offset;
    if (n.kind != expr_kind::symbol)
        return nullptr;
    const symbol_entry* e = symbols_.find(text(n.range));
    return e != nullptr ? e->offset_unit : nullptr;
}

} // namespace plumb::formula_check
