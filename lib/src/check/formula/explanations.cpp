// The notes that explain a mismatch: the term that is apart, and what it lacks (a g, a
// density, a fraction's 100, an atmosphere in other units).
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// "E_a = P*8760" with E_a in kWh, "m = V*7850" with m in kg: the sides differ by exactly a
// time or a density, and a number in the formula is one the trades write for it. It
// carries no unit, so the formula needs one given.
void checker::note_bare_quantity_apart(diagnostic& d, std::span<const operand> ops,
                                       const agreement& a) const {
    const std::optional<compact_dimension> apart = odd_one_apart(ops, a);
    if (!apart)
        return;
    struct bare_quantity {
        bool time; // else a density
        double value;
        const char* unit;
        const char* meaning;
    };
    // NIST SP 811 (2008), B.8: 1 d = 24 h = 1440 min = 86 400 s, 1 h = 3600 s; a year of
    // 365 d is 8760 h, a week 168 h. Densities: carbon steel 7850 kg/m³ (490 lb/ft³),
    // normal-weight concrete 2400 kg/m³ (150 lb/ft³), aluminium 2700 kg/m³ (common
    // practice; from memory).
    static constexpr std::array<bare_quantity, 12> quantities{{
        {true, 8760.0, "h", "the hours in a year"},
        {true, 365.0, "d", "the days in a year"},
        {true, 168.0, "h", "the hours in a week"},
        {true, 24.0, "h", "the hours in a day"},
        {true, 1440.0, "min", "the minutes in a day"},
        {true, 3600.0, "s", "the seconds in an hour"},
        {true, 86400.0, "s", "the seconds in a day"},
        {false, 7850.0, "kg/m^3", "steel's density"},
        {false, 490.0, "lb/ft^3", "steel's density"},
        {false, 2400.0, "kg/m^3", "concrete's density"},
        {false, 150.0, "lb/ft^3", "concrete's density"},
        {false, 2700.0, "kg/m^3", "aluminium's density"},
    }};
    bool time = false;
    try {
        time = *apart == time_dimension() || *apart == time_dimension().pow(-1);
        if (!time && !(*apart == density_dim) && !(*apart == density_dim.pow(-1)))
            return;
    } catch (const std::exception&) {
        return;
    }
    for (const operand& op : ops)
        for (std::uint32_t i = 0; i < op.type.literal_count; ++i) {
            const scale_literal& l = literals_[op.type.literal_begin + i];
            if (file_.nodes[l.node].kind != expr_kind::number)
                continue;
            for (const bare_quantity& q : quantities)
                if (q.time == time && l.value == q.value) {
                    const std::string_view written = text(file_.nodes[l.node].range);
                    d.notes.push_back(
                        {fmt::format("the sides differ by exactly a {}, and {} reads as {}: "
                                     "a number carries no unit, so write it with its own, "
                                     "{} {{{}}}",
                                     time ? "time" : "density", written, q.meaning, written,
                                     q.unit),
                         {}});
                    return;
                }
        }
}

// "E_s = P_d*h_d/1000" with h_d in h/d and E_s in MWh: a rate per day times a power is a
// power still, and a total over a season takes the number of days too. Named where the odd
// term lacks exactly a time and holds a symbol counted per day, week or year.
void checker::note_count_of_periods_left_out(diagnostic& d, std::span<const operand> ops,
                                             const agreement& a) const {
    const std::optional<compact_dimension> apart = odd_one_apart(ops, a);
    if (!apart || !(*apart == time_dimension()))
        return;
    static constexpr std::array<std::pair<std::string_view, std::string_view>, 10> periods{{
        {"/d", "day"},
        {"/day", "day"},
        {"/wk", "week"},
        {"/week", "week"},
        {"/yr", "year"},
        {"/a", "year"},
        {"/y", "year"},
        {"/year", "year"},
        {"/month", "month"},
        {"/mo", "month"},
    }};
    // The period a unit is counted per ("h/d": day), empty for none.
    const auto period_of = [&](std::string_view unit) -> std::string_view {
        for (const auto& [suffix, period] : periods)
            if (unit.size() > suffix.size() && unit.ends_with(suffix))
                return period;
        return {};
    };
    // "F_yr = FC*n_sh/1000" in L/yr with n_sh in shifts/yr: where the side set against it is
    // counted per period too, no count of periods is missing (here the hours of a shift are).
    for (std::size_t i = 0; i < ops.size(); ++i) {
        if (std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end())
            continue;
        const bool counted = for_each_factor(ops[i].node, [&](std::uint32_t at, int) {
            if (file_.nodes[at].kind != expr_kind::symbol)
                return false;
            const symbol_entry* e = symbols_.find(text(file_.nodes[at].range));
            return e != nullptr && !period_of(e->unit_text).empty();
        });
        if (counted)
            return;
    }
    for_each_factor(ops[a.odd.front()].node, [&](std::uint32_t at, int sign) {
        if (sign < 0 || file_.nodes[at].kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(file_.nodes[at].range);
        const symbol_entry* e = symbols_.find(name);
        const std::string_view period = e != nullptr ? period_of(e->unit_text) : "";
        // A month is no count the note names: a month's days vary.
        if (period.empty() || period == "month")
            return false;
        d.notes.push_back({fmt::format("'{}' is counted per {} ({}): a total over a longer time "
                                       "takes the number of {}s as a factor too",
                                       name, period, e->unit_text, period),
                           {}});
        return true;
    });
}

// What the first odd operand lacks against the others' dimension (their quotient), in a
// mismatch of a formula's size; nothing where it is not known.
std::optional<compact_dimension> checker::odd_one_apart(std::span<const operand> ops,
                                                        const agreement& a) const {
    if (!a.reference || ops.size() > notes_for_terms_up_to || a.odd.empty() ||
        !ops[a.odd.front()].type.known)
        return std::nullopt;
    try {
        return *a.reference / ops[a.odd.front()].type.dim;
    } catch (const std::exception&) {
        return std::nullopt;
    }
}

// "p = ρ*h", "H = p/ρ": the odd term differs from the others by exactly an acceleration,
// the most common slip of all, a missing (or doubled) g. Said outright, since the two
// dimensions alone ("momentum", "areal density") do not point at it.
// "is a g missing?", "is a density missing?": the two factors engineers leave out most, and
// the only ones a side can differ by exactly and be named for.
void checker::note_acceleration_or_density_apart(diagnostic& d, std::span<const operand> ops,
                                                 const agreement& a) const {
    const std::optional<compact_dimension> apart = odd_one_apart(ops, a);
    if (!apart)
        return;
    try {
        const std::string odd = quote(ops[a.odd.front()].node);
        // "Δp = 0.433*ρ_w*L" in psi: 0.433 psi/ft is water's weight per foot of column, g and
        // all (62.4 lbf/ft³ over 144 in²/ft²; 9.81 kPa/m; common practice), so the slip beside
        // a density is the density, not a g.
        const typed_term& odd_type = ops[a.odd.front()].type;
        const scale_literal* gradient = nullptr;
        for (std::uint32_t k = 0; k < odd_type.literal_count; ++k)
            if (const scale_literal& l = literals_[odd_type.literal_begin + k];
                l.exponent == 1.0 && (l.value == 0.433 || l.value == 0.4335 || l.value == 9.81 ||
                                      l.value == 0.0981 || l.value == 62.4))
                gradient = &l;
        if (*apart == acceleration_dimension() && gradient != nullptr)
            d.notes.push_back(
                {fmt::format("{} holds {}, water's weight per unit depth (0.433 psi/ft, 9.81 "
                             "kPa/m), g included: beside a density the density is the slip, "
                             "not a missing g; write it times a specific gravity",
                             odd, text(file_.nodes[gradient->node].range)),
                 {}});
        else if (*apart == acceleration_dimension() || *apart == acceleration_dimension().pow(-1))
            d.notes.push_back(
                {fmt::format("{} differs from the rest by exactly an acceleration: {}", odd,
                             *apart == acceleration_dimension() ? g_left_out_advice
                                                                : g_too_many_advice),
                 {}});
        // "Fr = v/sqrt(y)", "q = 0.221*A*Δh*ρ*(1 - ρ_i/ρ_r)^0.5*H^0.5": g left out of a square
        // root (Fr = v/√(g·y); a door's air exchange, Gosney and Olama, √(g·H); common
        // practice).
        // Not where g is typed as a number (9.81 beside feet), which is no missing g.
        else if ((*apart == acceleration_dimension().pow(rational(1, 2)) ||
                  *apart == acceleration_dimension().pow(rational(-1, 2))) &&
                 std::none_of(literals_.begin() + odd_type.literal_begin,
                              literals_.begin() + odd_type.literal_begin + odd_type.literal_count,
                              [](const scale_literal& l) { return is_typed_gravity(l); }))
            d.notes.push_back(
                {fmt::format("{} differs from the rest by exactly the square root of an "
                             "acceleration: {}",
                             odd,
                             *apart == acceleration_dimension().pow(rational(1, 2))
                                 ? "times \u221Ag it would match; is a g missing from a square "
                                   "root (\u221A(g*h), v/\u221A(g*y))?"
                                 : "divided by \u221Ag it would match; is a g missing from a "
                                   "square root below it (v/\u221A(g*y)), or is one there too "
                                   "many?"),
                 {}});
        // Not a fraction against a concentration (ppm against mg/L or mg/Nm³), which has
        // notes of its own.
        else if ((*apart == density_dim || *apart == density_dim.pow(-1)) &&
                 std::none_of(ops.begin(), ops.end(), [](const operand& op) {
                     return op.type.known && op.type.dim.is_dimensionless();
                 }))
            d.notes.push_back(
                {fmt::format("{} differs from the rest by exactly a density (a mass "
                             "against a volume): {} From a specific gravity, the density is "
                             "SG times water's",
                             odd,
                             *apart == density_dim
                                 ? "times a density it would match; is one missing (m = ρ*V)?"
                                 : "divided by a density it would match; is one missing "
                                   "from its denominator (V = m/ρ)?"),
                 {}});
        // "u = 62.4*z_w" in kPa from m: water's specific weight typed for feet and pounds.
        else if (*apart == density_dim * acceleration_dimension())
            note_specific_weight_apart(d, ops, a);
    } catch (const std::exception&) {
    }
}

// The sides differ by exactly a specific weight: water's, ρ_w·g_n, about 9.81 kN/m³ (62.4
// lbf/ft³; ρ_w from 995.65 to 999.975 kg/m³ between 0 and 30 °C, CRC Handbook, from memory),
// in the units the term and the rest are written in, which is the number the formula needs.
void checker::note_specific_weight_apart(diagnostic& d, std::span<const operand> ops,
                                         const agreement& a) const {
    const operand* reference = plain_reference_term(ops, a);
    const typed_term& odd = ops[a.odd.front()].type;
    if (reference == nullptr || !std::isfinite(odd.scale) || !(odd.scale > 0))
        return;
    // 1000 kg/m³ times g_n, per the unit the rest is in over the term's.
    constexpr double water = 1000.0 * 9.80665;
    const double here = water * odd.scale / reference->type.scale;
    d.notes.push_back(
        {fmt::format("{} differs from the rest by exactly a specific weight (\u03C1*g): for "
                     "water, \u03C1_w*{{g_n}} is about {:.3g} in the units written here (62.4 "
                     "in lbf/ft\u00B3, 9.81 in kN/m\u00B3)",
                     quote(ops[a.odd.front()].node), here),
         {}});
}

// The first term of the reference's dimension that is plainly in its unit: no numbers.
const operand* checker::plain_reference_term(std::span<const operand> ops,
                                             const agreement& a) const {
    if (!a.reference || ops.size() > notes_for_terms_up_to)
        return nullptr;
    for (std::size_t i = 0; i < ops.size(); ++i) {
        const typed_term& t = ops[i].type;
        if (std::find(a.odd.begin(), a.odd.end(), i) == a.odd.end() && t.known && !t.zero &&
            !t.numeric && t.dim == *a.reference && t.literal_count == 0 && std::isfinite(t.scale) &&
            t.scale > 0)
            return &ops[i];
    }
    return nullptr;
}

// A symbol, a cell, or a sum or difference of two symbols in one unit ("(h_o + z_b)" in ft,
// "(t_s - t_o)" in °C, a difference of kelvin size), with the unit it is declared in. Asked
// only of a term with no offset, where every reading in it is a difference.
// A factor of a product and its declared unit, through a written power ("D^2" gives D with
// exponent 2, -2 below a division); empty where the power is not a number or the factor has
// no declared unit.
std::optional<std::pair<std::uint32_t, declared_factor>>
checker::declared_factor_at(std::uint32_t at, int sign) const {
    const syntax::expr_node& n = file_.nodes[at];
    std::uint32_t base = at;
    double exponent = sign;
    if (n.kind == expr_kind::power) {
        base = syntax::inside_brackets(file_, n.lhs);
        if (file_.nodes[n.rhs].kind != expr_kind::number)
            return std::nullopt;
        exponent = sign * written_number(file_.nodes[n.rhs].range);
    }
    const std::optional<declared_factor> factor = declared_factor_of(base, exponent);
    if (!factor)
        return std::nullopt;
    return std::pair{base, *factor};
}

std::optional<declared_factor> checker::declared_factor_of(std::uint32_t k, double exponent) const {
    const syntax::expr_node& n = file_.nodes[k];
    if (n.kind == expr_kind::subtract || n.kind == expr_kind::add) {
        const syntax::expr_node& l = file_.nodes[syntax::inside_brackets(file_, n.lhs)];
        const syntax::expr_node& r = file_.nodes[syntax::inside_brackets(file_, n.rhs)];
        if (l.kind != expr_kind::symbol || r.kind != expr_kind::symbol)
            return std::nullopt;
        const symbol_entry* a = symbols_.find(text(l.range));
        const symbol_entry* b = symbols_.find(text(r.range));
        if (a == nullptr || b == nullptr || !a->compact_dim || a->unit_text != b->unit_text)
            return std::nullopt;
        return declared_factor{*a->compact_dim, a->si_factor, exponent, a->unit_text};
    }
    if (n.kind == expr_kind::symbol) {
        const symbol_entry* e = symbols_.find(text(n.range));
        // In a term with no offset a symbol in °C is a difference, of kelvin size.
        if (e == nullptr || !e->compact_dim)
            return std::nullopt;
        return declared_factor{*e->compact_dim, e->si_factor, exponent, e->unit_text};
    }
    if (n.kind == expr_kind::reference) {
        const syntax::reference_value& cell = file_.references[n.lhs];
        if (!cell.dim || cell.offset != nullptr)
            return std::nullopt;
        const auto dim = compact_dimension::fitted(*cell.dim);
        if (!dim)
            return std::nullopt;
        return declared_factor{*dim, cell.scale, exponent, {}};
    }
    return std::nullopt;
}

// "P_hp = Q_cfm*Δp_Pa/(6356*η)": a number that is the conversion the units need once one
// symbol is read in the other system's unit (6356 is for inches of water). Said so, where
// the advice alone would divide by 1.58 × 10⁶ and leave the symbol in the unit it was not
// written for.
// "V_fps = 0.4085*Q_gpm/D_mm^2": the trade's number may fold a circle's 4/π into the
// conversion (0.4085 = 4/π × 0.3208 for gpm over in² to ft/s; common practice); `folded` is then
// 4/π (or π/4), the part of the number that is the formula's own.
std::optional<std::string> checker::coefficient_for_other_unit(const operand& term,
                                                               const operand& other_term,
                                                               const scale_literal& number,
                                                               double needed,
                                                               double& folded) const {
    folded = 1.0;
    const double written = std::pow(number.value, number.exponent);
    if (!(written > 0) || !std::isfinite(written) || !(needed > 0) || !std::isfinite(needed))
        return std::nullopt;
    // Rounded trade numbers (6356 for 6343) lie within a per cent of the conversion.
    constexpr double within = 0.01;
    std::uint32_t found_node = syntax::no_index;
    std::string_view found_declared;
    const unit_counterpart* found_other = nullptr;
    double other_in_declared = 0.0;
    bool ambiguous = false;
    // A factor of the number's own term changes what the number must be by the factor's
    // change of unit; one of the term it is set against, by the inverse.
    const auto try_factors_of = [&](const operand& where, double direction) {
        for_each_factor(where.node, [&](std::uint32_t at, int sign) {
            const auto declared = declared_factor_at(at, sign);
            if (!declared || !(declared->second.si_scale > 0))
                return false;
            const auto& [base, factor] = *declared;
            const counterparts_of_unit units = unit_counterparts(factor.dim, factor.si_scale);
            for (const unit_counterpart& other : units.others) {
                const double swapped = needed * std::pow(other.si_scale / factor.si_scale,
                                                         direction * factor.exponent);
                double fold = 1.0;
                for (const double circle : {1.0, 4.0 / std::numbers::pi, std::numbers::pi / 4.0})
                    if (std::abs(written / (swapped * circle) - 1.0) <= within)
                        fold = circle;
                if (std::abs(written / (swapped * fold) - 1.0) > within)
                    continue;
                folded = fold;
                ambiguous = found_other != nullptr;
                found_node = base;
                found_declared = factor.unit_text.empty() ? units.declared : factor.unit_text;
                found_other = &other;
                other_in_declared = other.si_scale / factor.si_scale;
            }
            return ambiguous;
        });
    };
    try_factors_of(term, 1.0);
    if (!ambiguous)
        try_factors_of(other_term, -1.0);
    if (found_other == nullptr || ambiguous)
        return std::nullopt;
    const std::string_view symbol = text(file_.nodes[found_node].range);
    return fmt::format("{} fits these units with {} in {}, but it is in {}: convert '{}' to {} "
                       "first (1 {} = {} {}), or write the factor for {}",
                       text(file_.nodes[number.node].range), quote(found_node), found_other->name,
                       found_declared, symbol, found_other->name, found_other->name,
                       format_factor(std::nullopt, other_in_declared), found_declared,
                       found_declared);
}

// A trade's constant typed for one unit system beside a symbol declared in the other's
// (check/constant_in_other_units.hpp). In "0.433*h_m + p_psi" the term with the number is
// the majority's, so every term with numbers is tried against the first plain term of
// another dimension.
bool checker::note_constant_for_other_units(diagnostic& d, std::span<const operand> ops,
                                            const agreement& a) {
    if (!a.reference || ops.size() > notes_for_terms_up_to)
        return false;
    for (std::size_t i = 0; i < ops.size(); ++i) {
        const typed_term& t = ops[i].type;
        std::array<std::string_view, 8> texts{};
        if (!t.known || t.numeric || t.offset != nullptr || t.literal_count == 0 ||
            t.literal_count > texts.size() || !std::isfinite(t.scale) || !(t.scale > 0))
            continue;
        const auto plain = std::find_if(ops.begin(), ops.end(), [&](const operand& o) {
            return o.type.known && !o.type.zero && !o.type.numeric && o.type.literal_count == 0 &&
                   o.type.offset == nullptr && std::isfinite(o.type.scale) && o.type.scale > 0 &&
                   !(o.type.dim == t.dim);
        });
        if (plain == ops.end())
            continue;
        const operand* reference = &*plain;
        dimension lacking;
        try {
            lacking = (reference->type.dim / t.dim).expand();
        } catch (const std::exception&) {
            continue;
        }
        const std::span<const scale_literal> numbers(literals_.data() + t.literal_begin,
                                                     t.literal_count);
        // The cheap test first: most mismatches hold no number a quantity could be.
        if (!numbers_could_carry(numbers, lacking, texts))
            continue;
        std::array<declared_factor, 8> factors{};
        std::array<std::uint32_t, 8> factor_nodes{};
        std::size_t factor_count = 0;
        // Every factor but the numbers must be one the search can weigh: a factor it
        // cannot (a function's value, a sum) might hold the unit that is off, and a
        // reading that passed it by would name the wrong symbol.
        bool unweighed = false;
        for_each_factor(ops[i].node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number || n.kind == expr_kind::pi)
                return false;
            const auto declared = declared_factor_at(at, sign);
            if (!declared)
                return unweighed = true;
            factor_nodes[factor_count] = declared->first;
            factors[factor_count++] = declared->second;
            return unweighed = factor_count == factors.size();
        });
        if (unweighed)
            continue;
        // "u_psi = 62.4*h_ft": the number fits where the result's unit is the other one.
        if (factor_count < factors.size()) {
            const std::uint32_t plain_node = syntax::inside_brackets(file_, reference->node);
            if (const auto factor = declared_factor_of(plain_node, -1.0)) {
                factor_nodes[factor_count] = plain_node;
                factors[factor_count++] = *factor;
            }
        }
        const auto found = read_constant_in_other_units(t.scale, reference->type.scale, numbers,
                                                        {texts.data(), numbers.size()}, lacking,
                                                        kind_of(t), {factors.data(), factor_count});
        if (!found)
            continue;
        d.notes.push_back(
            {constant_in_other_units_message(
                 quote(numbers[found->reading.literal].node),
                 fmt::format("'{}'", display_text(file_.nodes[factor_nodes[found->factor]].range)),
                 *found),
             {}});
        return true;
    }
    return false;
}

// "u = 9.81*z_ft": standard gravity written for metres and seconds in a term whose units are
// feet (or 32.2 beside metres). The dimensions show a missing acceleration, but the
// acceleration is there: the slip is the units around it, which this note names.
bool checker::note_gravity_in_other_units(diagnostic& d, std::span<const operand> ops,
                                          const agreement& a) {
    const operand* reference = plain_reference_term(ops, a);
    if (reference == nullptr)
        return false;
    const double reference_scale = reference->type.scale;
    struct gravity_unit {
        const char* name;
        const char* system;
        double metres; // NIST SP 811 (2008), B.8: 1 ft = 0.3048 m exactly
    };
    static constexpr std::array<gravity_unit, 2> units{
        {{"m/s\u00B2", "metres", 1.0}, {"ft/s\u00B2", "feet", 0.3048}}};
    constexpr double standard_gravity = 9.80665; // SI Brochure 9th ed., Table 8 (g_n)
    for (const std::size_t i : a.odd) {
        const typed_term& t = ops[i].type;
        if (!t.known || t.numeric || t.literal_count == 0 || !std::isfinite(t.scale))
            continue;
        // g multiplying (ρ·9.81·h) or dividing (V²/(2·9.81)), and 2g as one number (19.62).
        int power = 0;
        try {
            if (*a.reference / t.dim == acceleration_dimension())
                power = 1;
            else if (t.dim / *a.reference == acceleration_dimension())
                power = -1;
        } catch (const std::exception&) {
            continue;
        }
        if (power == 0)
            continue;
        for (std::uint32_t k = 0; k < t.literal_count; ++k) {
            const scale_literal& l = literals_[t.literal_begin + k];
            if (l.exponent != power)
                continue;
            const std::string written = display_text(file_.nodes[l.node].range);
            for (const gravity_unit& u : units) {
                const double g = standard_gravity / u.metres;
                const double times = std::abs(l.value / (2.0 * g) - 1.0) <= 0.005 ? 2.0 : 1.0;
                // 19.62 is twice a rounded 9.81: twice the rounding too.
                if (std::abs(l.value - times * g) >
                        times * half_unit_in_last_digit(written) * (1.0 + 1e-9) ||
                    std::abs(l.value / (times * g) - 1.0) > 0.005)
                    continue;
                // As the unit-scale findings count it: the value as written over the value
                // in the reference's unit.
                const double ratio = reference_scale / (std::pow(u.metres, power) * t.scale);
                if (std::abs(ratio - 1.0) < 0.01)
                    continue;
                d.notes.push_back(
                    {fmt::format("{} is {}standard gravity in {}, but the other units of {} are "
                                 "not all {} and seconds: read so, it counts {:.6g} times as "
                                 "much as {}; write gravity in the units around it, or "
                                 "convert them first",
                                 written, times == 2.0 ? "twice " : "", u.name, quote(ops[i].node),
                                 u.system, ratio, quote(reference->node)),
                     {}});
                return true;
            }
        }
    }
    return false;
}

// "Cl_ppm = Cl_mgL": ppm by mass is a fraction, mg/L a mass per volume; in dilute water the
// trades take them as equal (common practice), the water's density, 1 kg/L, between them.
// The sides differ in dimension by exactly a density: say so, and how to write it.
void checker::note_fraction_beside_concentration(diagnostic& d, std::span<const operand> sides) {
    constexpr compact_dimension density = compact_dimension::whole({1, -3, 0, 0, 0, 0, 0});
    if (sides.size() != 2 || !sides[0].type.known || !sides[1].type.known)
        return;
    try {
        const dimension apart = (sides[0].type.dim / sides[1].type.dim).expand();
        const auto fitted = compact_dimension::fitted(apart);
        if (!fitted || !(*fitted == density || *fitted == compact_dimension{} / density))
            return;
    } catch (const std::exception&) {
        return;
    }
    if (!holds_symbol_in_unit(sides[0].node, {"ppm", "ppb"}) &&
        !holds_symbol_in_unit(sides[1].node, {"ppm", "ppb"}))
        return;
    // Per litre of water, not mg/Nm³ of a flue gas (where ppm is by volume).
    if (!holds_symbol_in_unit(sides[0].node, {"/L", "/l"}) &&
        !holds_symbol_in_unit(sides[1].node, {"/L", "/l"}))
        return;
    d.notes.push_back({"ppm and ppb by mass are fractions, mg/L a mass per volume: in dilute "
                       "water 1 mg/L is taken as 1 ppm, the water's density (1 kg/L) between "
                       "them; write it (ρ_w : kg/L = 1) on the side in mg/L to say so",
                       {}});
}

// "V <= 7.5": a limit typed as a bare number has no unit; say how to give it one, in the
// unit of the other side when that side is one symbol declared by unit.
void checker::note_bare_number_side(diagnostic& d, std::span<const operand> sides) const {
    if (sides.size() != 2)
        return;
    for (std::size_t i = 0; i < 2; ++i) {
        const syntax::expr_node& bare = file_.nodes[sides[i].node];
        const syntax::expr_node& other = file_.nodes[sides[1 - i].node];
        if (bare.kind != syntax::expr_kind::number || !sides[1 - i].type.known)
            continue;
        std::string unit = "<unit>";
        if (other.kind == syntax::expr_kind::symbol)
            if (const symbol_entry* e = symbols_.find(text(other.range));
                e != nullptr && !e->unit_text.empty())
                unit = std::string(e->unit_text);
        d.notes.push_back({fmt::format("a bare number has no unit; give it the other side's, "
                                       "as in {} {{{}}}",
                                       display_text(bare.range), unit),
                           {}});
        return;
    }
    // "TDS = 0.7*κ": a number times one symbol, where the number is an empirical factor
    // with units of its own (ppm per µS/cm).
    for (std::size_t i = 0; i < 2; ++i) {
        const syntax::expr_node& product = file_.nodes[sides[i].node];
        if (product.kind != syntax::expr_kind::multiply &&
            product.kind != syntax::expr_kind::divide)
            continue;
        const syntax::expr_node& left = file_.nodes[product.lhs];
        const syntax::expr_node& right = file_.nodes[product.rhs];
        const bool number_left =
            left.kind == syntax::expr_kind::number && right.kind == syntax::expr_kind::symbol;
        const bool number_right =
            right.kind == syntax::expr_kind::number && left.kind == syntax::expr_kind::symbol;
        if (!number_left && !number_right)
            continue;
        const std::string number = display_text((number_left ? left : right).range);
        // "t_half = 0.693*k": a side the reciprocal of the other (a time against a rate)
        // is a symbol on the wrong side of the line, ln 2 over the rate; no factor of units
        // makes a time of a rate.
        const typed_term& here = sides[i].type;
        const typed_term& there = sides[1 - i].type;
        if (here.known && there.known && !here.dim.is_dimensionless() &&
            (here.dim * there.dim).is_dimensionless()) {
            const syntax::expr_node& symbol = number_left ? right : left;
            d.notes.push_back(
                {fmt::format("the two sides are reciprocals of each other: '{}' may belong "
                             "below the line, as in {}/{}",
                             display_text(symbol.range), number, display_text(symbol.range)),
                 {}});
            return;
        }
        // "g_k = m/1000" (kN/m² from kg/m²): a power of ten converts; the note below names
        // what is missing (a g), and no unit of a fit's constant is in it.
        if (near_power_of_ten(written_number((number_left ? left : right).range), 1e-12))
            return;
        d.notes.push_back({fmt::format("if {} is an empirical factor that carries units of "
                                       "its own, write it as {}? for plumb to work out its "
                                       "dimension, and state it once reviewed ({}?[...])",
                                       number, number, number),
                           {}});
        return;
    }
}

// The term, and the units of the symbols in it, which say where a factor comes from.
void checker::add_term_and_units(diagnostic& d, const operand& op) const {
    add_term(d, op);
    const std::string units = units_in(op.node);
    if (!units.empty())
        d.notes.push_back({units, {}});
}

void checker::add_term(diagnostic& d, const operand& op, bool differs) const {
    d.terms.push_back({{file_.source, file_.nodes[op.node].range},
                       display_text(file_.nodes[op.node].range),
                       op.type.dim.expand(),
                       differs});
}

// "p_a/14.5 + 1.013": a number in a sum of readings is read in the sum's unit, so it is shown
// with the sum's dimension, not as a dimensionless term that does not match.
void checker::add_number_term(diagnostic& d, const operand& number,
                              const compact_dimension& read_as) const {
    typed_term type = number.type;
    if (type.numeric && type.dim.is_dimensionless())
        type.dim = read_as;
    add_term(d, {type, number.node, number.subtracted});
}

// Notes for operands that disagree: each odd one with its dimension, then the rest.
void checker::explain(diagnostic& d, std::span<const operand> ops, const agreement& a,
                      std::string_view others) const {
    // A sum of thousands of terms must not bury the finding (or slow the renderers):
    // the odd ones are all named, the agreeing ones up to a handful.
    constexpr std::size_t max_listed = 8;
    constexpr std::size_t max_odd = 32;
    for (std::size_t k = 0; k < a.odd.size() && k < max_odd; ++k) {
        add_term(d, ops[a.odd[k]], true);
        d.notes.push_back(
            {fmt::format("{} is {}", quote(ops[a.odd[k]].node), describe(ops[a.odd[k]].type.dim)),
             {},
             true});
    }
    if (a.odd.size() > max_odd)
        d.notes.push_back({fmt::format("and {} more that differ", a.odd.size() - max_odd), {}});
    std::vector<bool> is_odd(ops.size(), false);
    for (const std::size_t k : a.odd)
        is_odd[k] = true;
    std::vector<std::size_t> agreeing_index;
    for (std::size_t i = 0; i < ops.size(); ++i)
        if (ops[i].type.known && !ops[i].type.zero && !is_odd[i])
            agreeing_index.push_back(i);
    const std::size_t agreeing_count = agreeing_index.size();
    if (agreeing_count > max_listed) {
        // Keep the ones nearest the first odd term: they are what the reader sees beside it.
        const std::size_t odd = a.odd.front();
        std::stable_sort(agreeing_index.begin(), agreeing_index.end(),
                         [odd](std::size_t x, std::size_t y) {
                             return (x > odd ? x - odd : odd - x) < (y > odd ? y - odd : odd - y);
                         });
        agreeing_index.resize(max_listed);
        std::sort(agreeing_index.begin(), agreeing_index.end());
    }
    std::vector<std::string> agreeing;
    for (std::size_t i : agreeing_index) {
        add_term(d, ops[i]);
        agreeing.push_back(quote(ops[i].node));
    }
    if (agreeing_count > max_listed)
        agreeing.push_back(fmt::format("and {} more", agreeing_count - max_listed));
    // With more than are listed, the note's count is news the terms do not carry.
    const bool restates = agreeing_count <= max_listed;
    if (agreeing_count == 1)
        d.notes.push_back(
            {fmt::format("{} is {}", agreeing.front(), describe(*a.reference)), {}, restates});
    else if (agreeing_count > 1)
        d.notes.push_back({fmt::format("the other {} are {}: {}", others, describe(*a.reference),
                                       fmt::join(agreeing, ", ")),
                           {},
                           restates});
}

} // namespace plumb::formula_check
