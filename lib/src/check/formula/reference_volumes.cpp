// Gas volumes at reference conditions (normal, standard, free air) against actual ones, and
// the reference temperatures that reconcile them.
#include "check/formula/checker.hpp"

#include "model/ascii_case.hpp"

namespace plumb::formula_check {

// The unit a symbol is declared in, or a workbook cell's written unit.
std::optional<std::string_view> checker::declared_unit_text(std::uint32_t at) const {
    const syntax::expr_node& n = file_.nodes[at];
    if (n.kind == expr_kind::symbol) {
        const symbol_entry* e = symbols_.find(text(n.range));
        return e != nullptr ? std::optional(e->unit_text) : std::nullopt;
    }
    if (n.kind == expr_kind::reference && !file_.references[n.lhs].unit_text.empty())
        return file_.references[n.lhs].unit_text;
    return std::nullopt;
}

// The one symbol of a product of it and numbers that only convert units, else no_index;
// with `cells_too`, a workbook's cell counts as a symbol.
std::uint32_t checker::sole_symbol_times_conversions(std::uint32_t k, bool cells_too) const {
    std::uint32_t found = syntax::no_index;
    const bool other = for_each_factor(k, [&](std::uint32_t at, int) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::symbol || (cells_too && n.kind == expr_kind::reference)) {
            const bool second = found != syntax::no_index;
            found = at;
            return second;
        }
        // Conversions only: 600 (LNG's expansion) or 0.95 could be the correction itself.
        return n.kind != expr_kind::number || !plain_conversion_number(at);
    });
    return other ? syntax::no_index : found;
}

// The one symbol of a product whose other factors are numbers, above the line; none where
// there is another factor or the symbol divides. Where the sides agree in unit already the
// numbers convert it, rounded (14.5) or not.
std::uint32_t checker::sole_symbol_times_numbers(std::uint32_t k) const {
    std::uint32_t found = syntax::no_index;
    const bool other = for_each_factor(k, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::symbol) {
            const bool second = found != syntax::no_index;
            found = at;
            return second || sign < 0;
        }
        return n.kind != expr_kind::number;
    });
    return other ? syntax::no_index : found;
}

// "Q_s : scfm "exhaust, standard at 68 °F"": a gas volume whose description states a
// reference temperature other than its unit's usual one (the US EPA's standard cubic foot
// at 68 °F, 40 CFR 60.2, from memory, beside the gas trade's 60 °F): the stated one rules.
// Read from the first temperature written in °C or °F between -10 and 40 °C.
std::optional<reference_volume> checker::stated_reference_volume(const symbol_entry& e) {
    std::optional<reference_volume> v = reference_volume_in(e.unit_text);
    const std::string_view d = e.description;
    if (!v || d.empty())
        return v;
    const auto digit = [](char c) { return c >= '0' && c <= '9'; };
    for (std::size_t at = 0; at < d.size(); ++at) {
        if (!digit(d[at]) || (at > 0 && (digit(d[at - 1]) || d[at - 1] == '.')))
            continue;
        std::size_t end = at;
        while (end < d.size() && (digit(d[end]) || d[end] == '.'))
            ++end;
        std::size_t unit = end;
        while (unit < d.size() && d[unit] == ' ')
            ++unit;
        std::string_view rest = d.substr(unit);
        std::size_t mark = 0;
        if (rest.starts_with("\u00B0"))
            mark = 2;
        else if (rest.starts_with("deg "))
            mark = 4;
        if (rest.size() <= mark || (rest[mark] != 'C' && rest[mark] != 'F') ||
            (rest.size() > mark + 1 &&
             std::isalpha(static_cast<unsigned char>(rest[mark + 1])) != 0))
            continue;
        const double value = std::strtod(std::string(d.substr(at, end - at)).c_str(), nullptr);
        const double kelvins = rest[mark] == 'C' ? value + 273.15 : (value + 459.67) * 5.0 / 9.0;
        if (kelvins < 263.15 || kelvins > 313.15)
            continue;
        v->kelvins = kelvins;
        v->name = d.substr(at, unit + mark + 1 - at);
        return v;
    }
    return v;
}

// The reference state every term of a short sum shares, as a term's power 1; empty where
// one has none or another.
std::optional<reference_volume> checker::reference_volume_of_sum(std::uint32_t k) const {
    constexpr int most_terms = 8;
    std::optional<reference_volume> shared;
    int terms = 0;
    while (file_.nodes[k].kind == expr_kind::add || file_.nodes[k].kind == expr_kind::subtract) {
        const std::optional<reference_volume> r = reference_volume_of(file_.nodes[k].rhs);
        if (!r || r->power != 1 || ++terms > most_terms ||
            (shared && shared->kelvins != r->kelvins))
            return std::nullopt;
        shared = r;
        k = file_.nodes[k].lhs;
    }
    const std::optional<reference_volume> first = reference_volume_of(k);
    if (!first || first->power != 1 || (shared && shared->kelvins != first->kelvins))
        return std::nullopt;
    reference_volume sum = *first;
    sum.numbers = 1.0;
    sum.rounding = 0.0;
    return sum;
}

// A product of symbols and numbers whose gas volumes at reference conditions all share one
// reference temperature: that temperature, and the net power the volumes stand in.
std::optional<reference_volume> checker::reference_volume_of(std::uint32_t k) const {
    std::optional<reference_volume> found;
    double numbers = 1.0;
    double rounding = 0.0;
    bool other = false;
    for_each_factor(k, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        std::optional<reference_volume> r;
        if (n.kind == expr_kind::number) {
            const scale_literal& l = read_number(text(n.range)).literal;
            if (!(l.value > 0.0))
                return other = true;
            numbers *= sign > 0 ? l.value : 1.0 / l.value;
            rounding += l.tolerance;
            return false;
        }
        if (n.kind == expr_kind::add || n.kind == expr_kind::subtract) {
            // "(V_a + V_n)/A": a sum of gas volumes at one reference state is at it too.
            r = reference_volume_of_sum(at);
            if (!r)
                return other = true;
        } else if (n.kind == expr_kind::reference) {
            // A workbook's cell carries the reference state its unit text names.
            const syntax::reference_value& cell = file_.references[n.lhs];
            if (cell.reference_power == 0)
                return false;
            r = reference_volume{cell.reference_kelvins, cell.reference_power, cell.reference_name};
        } else if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || (unit_marks_of(e->unit_text) & at_reference_conditions) == 0)
                return false;
            r = stated_reference_volume(*e);
        } else {
            return other = true;
        }
        if (!r || (found && found->kelvins != r->kelvins))
            return other = true;
        const int power = (found ? found->power : 0) + sign * r->power;
        found = *r;
        found->power = power;
        return false;
    });
    if (other || !found || found->power == 0)
        return std::nullopt;
    found->numbers = numbers;
    found->rounding = rounding;
    return found;
}

// "V_scf = 35.31*V_Nm3": the two sides agree as volumes, but a normal cubic metre is gas
// at 0 °C and a standard cubic foot at 60 °F: the same gas fills 5.7 % more at 60 °F, which
// a volume factor alone leaves out (1 Nm³ = 37.33 scf). Where the reference temperatures
// differ by less than the base pressures' spread (15 °C and 60 °F: 0.2 %), nothing is said.
void checker::report_reference_temperatures_left_out(std::span<const operand> sides) {
    const std::optional<reference_volume> a = reference_volume_of(sides[0].node);
    const std::optional<reference_volume> b = reference_volume_of(sides[1].node);
    if (!a || !b || a->power != b->power || std::abs(a->power) != 1 ||
        std::abs(a->kelvins / b->kelvins - 1.0) <= reference_temperature_slack)
        return;
    // The sides' values in SI per number written, every number counted: equal as volumes
    // is the slip; equal as amounts of gas (V_n = V_s*273.15/288.15) is the conversion.
    const double as_volumes =
        (sides[0].type.scale / a->numbers) / (sides[1].type.scale / b->numbers);
    // "Q_scfm = 0.5885*Q_N": 35.31/60 typed to four digits, cut rather than rounded from
    // 0.588578, is the volume factor still; no reference temperatures lie so close together.
    const double rounding = std::max(a->rounding + b->rounding, 3e-4) + 1e-9;
    // "V_N = V_S*288.15/273.15": the temperatures' ratio written, but turned over; the result
    // is off by its square (11 % between 0 and 15 °C).
    const double turned = std::pow(b->kelvins / a->kelvins, a->power);
    if (std::abs(as_volumes / turned - 1.0) <= rounding + 1e-4) {
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is gas at {} and {} at {}, but the ratio written between them is "
                        "turned over: as written the result is {} % off",
                        quote(sides[0].node), a->name, quote(sides[1].node), b->name,
                        format_factor(std::round(std::abs(turned * turned - 1.0) * 1000.0) / 10.0)),
            file_.nodes[sides[1].node].range);
        d.level = severity::warning;
        d.notes.push_back(
            {fmt::format("a volume at reference conditions scales with its "
                         "reference temperature: from {} to {} it is multiplied "
                         "by {}/{} (K)",
                         b->name, a->name, format_factor(a->kelvins), format_factor(b->kelvins)),
             {}});
        return;
    }
    if (!(std::abs(as_volumes - 1.0) <= rounding))
        return;
    diagnostic& d =
        report(rules::unit_scale,
               fmt::format("the sides agree {}, but {} is gas at {} and {} at {}: a volume "
                           "factor alone leaves out the reference temperatures, {} %",
                           a->power > 0 ? "as volumes" : "per volume", quote(sides[0].node),
                           a->name, quote(sides[1].node), b->name,
                           format_factor(std::round((std::max(a->kelvins, b->kelvins) /
                                                         std::min(a->kelvins, b->kelvins) -
                                                     1.0) *
                                                    1000.0) /
                                         10.0)),
               file_.nodes[sides[1].node].range);
    d.level = severity::warning;
    d.notes.push_back({"at one pressure, a gas volume at reference conditions scales with its "
                       "reference temperature: 1 Nm³ (0 °C) = 1.0549 Sm³ (15 °C) = 37.33 scf "
                       "(60 °F), all at 101.325 kPa",
                       {}});
}

// Whether two operands that disagree as volumes agree as amounts of gas, each volume at
// its reference temperature, within the rounding of their numbers.
bool checker::reference_temperatures_reconcile(std::uint32_t odd_node, std::uint32_t reference_node,
                                               const scaled_operand& odd,
                                               const scaled_operand& reference) const {
    const std::optional<reference_volume> a = reference_volume_of(odd_node);
    const std::optional<reference_volume> b = reference_volume_of(reference_node);
    if (!a || !b || a->power != b->power || a->kelvins == b->kelvins)
        return false;
    const double rounding = reference_temperature_slack + a->rounding + b->rounding;
    // Each side's SI value per number written, every number counted. A volume at T_ref
    // holds 1/T_ref of gas per unit: the sides agree as amounts where the ratio of their
    // volume scales is the reference temperatures' ratio.
    const double ratio = (reference.scale / b->numbers) / (odd.scale / a->numbers);
    const double wanted = std::pow(b->kelvins / a->kelvins, a->power);
    return std::abs(ratio / wanted - 1.0) <= rounding;
}

// "Q_n = Q_act" with Q_n in Nm3/h and Q_act in m³/h: a normal or standard volume is the
// gas's volume at the reference pressure and temperature, and the actual one needs
// (p/p_n)·(T_n/T) to become it; the units alone cannot say so, as both are volumes.
// Asked only where one side is a symbol at reference conditions and the other an actual
// volume times numbers, with nothing that could correct it.
void checker::report_actual_volume_as_normal(std::span<const operand> sides) {
    const auto symbol_of = [&](std::uint32_t k) -> const symbol_entry* {
        k = syntax::inside_brackets(file_, k);
        return file_.nodes[k].kind == expr_kind::symbol ? symbols_.find(text(file_.nodes[k].range))
                                                        : nullptr;
    };
    for (std::size_t i = 0; i < 2; ++i) {
        const symbol_entry* normal = symbol_of(sides[i].node);
        if (normal == nullptr || (unit_marks_of(normal->unit_text) & at_reference_conditions) == 0)
            continue;
        const std::uint32_t actual_node = sole_symbol_times_conversions(sides[1 - i].node);
        if (actual_node == syntax::no_index)
            return;
        const std::string_view actual_name = text(file_.nodes[actual_node].range);
        const symbol_entry* actual = symbols_.find(actual_name);
        // "V_scfh = Q_Btuh/1000": a heat over the gas's heating value is no actual volume.
        if (actual == nullptr || actual->unit_text.empty() ||
            (unit_marks_of(actual->unit_text) & at_reference_conditions) != 0 ||
            !actual->compact_dim || !is_gas_volume_or_flow(*actual->compact_dim))
            return;
        // Free air is at the intake, some 15 to 35 °C: near a standard volume's 15 °C or
        // 60 °F, but 5 to 13 % from a normal one's 0 °C.
        const std::optional<reference_volume> reference = reference_volume_of(sides[i].node);
        if (describes_free_air(*actual) && reference && reference->kelvins >= 288.0) {
            diagnostic& d = report(
                rules::trade_constant,
                fmt::format("'{}' is free air, a volume at the compressor's intake, near the "
                            "atmosphere, and is read as one at {}'s reference conditions",
                            actual_name, normal->unit_text),
                file_.nodes[sides[1 - i].node].range);
            d.level = severity::note;
            d.notes.push_back({"free air delivered is stated at the intake's pressure and "
                               "temperature (ISO 1217, from memory), a few per cent from the "
                               "reference state; correct it by (p/p_n)*(T_n/T) where that "
                               "matters",
                               {}});
            return;
        }
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("'{}' is a volume of gas at its actual pressure and temperature ({}) "
                        "and {} one at reference conditions ({}): they differ by the gas's "
                        "state, which this formula does not correct for",
                        actual_name, actual->unit_text, quote(sides[i].node), normal->unit_text),
            file_.nodes[sides[1 - i].node].range);
        d.level = severity::warning;
        d.notes.push_back({std::string(state_correction_advice), {}});
        return;
    }
    report_actual_product_as_normal(sides);
}

// "Q_cfm : cfm "air flow for the blower vendor, normal"": a volume in a plain unit that
// its description puts at reference conditions.
bool checker::describes_reference_state(std::uint32_t node) const {
    node = syntax::inside_brackets(file_, node);
    if (file_.nodes[node].kind != expr_kind::symbol)
        return false;
    const symbol_entry* e = symbols_.find(text(file_.nodes[node].range));
    if (e == nullptr)
        return false;
    for (const std::string_view word : {"normal", "standard", "Normal", "Standard"})
        if (e->description.find(word) != std::string_view::npos)
            return true;
    return false;
}

// A volume described as free air ("l/min FAD", "free-air consumption"): the compressor
// trade's air at the intake, which it converts to standard volumes by the unit alone.
bool checker::describes_free_air(const symbol_entry& e) {
    const std::string lower = lower_ascii(e.description);
    return e.description.find("FAD") != std::string_view::npos ||
           lower.find("free air") != std::string::npos ||
           lower.find("free-air") != std::string::npos;
}

// "ṁ = C_mg*Q_a*..." with C in mg/Sm³ and Q_a in acfm: a concentration per volume at
// reference conditions times a volume at the gas's actual state counts the gas as if it
// were at the reference state, some 5 to 15 % off at a blower's inlet. Asked where the
// product holds nothing that could correct it: no pressure, no temperature, no number
// but plain conversions.
bool checker::report_normal_measure_times_actual_volume(const operand& side) {
    const std::optional<reference_volume> normal = reference_volume_of(side.node);
    if (!normal || normal->power != -1)
        return false;
    std::uint32_t actual_node = syntax::no_index;
    std::uint32_t normal_node = syntax::no_index;
    const bool other = for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number) {
            // A state correction is a number near 1 (0.95, 1.07); 453592 mg/lb is none.
            const double v = written_number(n.range);
            return !plain_conversion_number(at) && !(v >= 10.0 || (v > 0 && v <= 0.1));
        }
        if (n.kind != expr_kind::symbol)
            return true;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || !e->compact_dim)
            return true;
        // Asked before the pressure's test: a heating value per Nm³ (MJ/Nm³) has a pressure's
        // dimension, and is no pressure that could correct the state.
        if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0) {
            normal_node = at;
            return false;
        }
        if (*e->compact_dim == pressure_dimension() || *e->compact_dim == temperature_dimension())
            return true;
        if (sign > 0 && is_gas_volume_or_flow(*e->compact_dim) && names_actual_volume(*e))
            actual_node = at;
        return false;
    });
    if (other || actual_node == syntax::no_index || normal_node == syntax::no_index)
        return false;
    const symbol_entry& actual = *symbols_.find(text(file_.nodes[actual_node].range));
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("{} counts per volume at reference conditions ({}) and {} is a volume of "
                    "gas at its actual pressure and temperature ({}): their product takes "
                    "the actual volume as if it were at the reference state, which this "
                    "formula does not correct for",
                    quote(normal_node),
                    symbols_.find(text(file_.nodes[normal_node].range))->unit_text,
                    quote(actual_node), actual.unit_text),
        file_.nodes[side.node].range);
    d.level = severity::warning;
    d.notes.push_back({std::string(state_correction_advice), {}});
    return true;
}

// "P_f = V_n*Δp_f/(3600*1000*η_f)" with V_n in Nm³/h: a fan's or a blower's power is the
// actual volume flow through it times its pressure rise (P = Q·Δp/η, common practice);
// the normal flow leaves out the gas's state, some 2.5 times at a kiln's 350 °C exit.
// Asked of a product of one normal flow and one pressure with no temperature or other
// pressure beside them that could correct it.
bool checker::report_power_from_normal_flow(const operand& side) {
    const std::optional<reference_volume> normal = reference_volume_of(side.node);
    if (!normal || normal->power != 1)
        return false;
    std::uint32_t pressure = syntax::no_index;
    int pressures = 0;
    bool correction = false;
    std::uint32_t flow = syntax::no_index;
    for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        // p_n*V_n*ln(p_2/p_1): a compressor's isothermal work, its pressure at the flow's
        // own reference state; no fan's Q·Δp.
        if (n.kind == expr_kind::call || n.kind == expr_kind::power)
            correction = true;
        if (n.kind != expr_kind::symbol)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || !e->compact_dim)
            return false;
        if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0)
            flow = at;
        else if (*e->compact_dim == pressure_dimension()) {
            if (names_atmosphere(at) || describes_reference_state(at))
                correction = true;
            ++pressures;
            if (sign > 0)
                pressure = at;
        } else if (*e->compact_dim == temperature_dimension())
            correction = true;
        return false;
    });
    if (pressures != 1 || pressure == syntax::no_index || correction || flow == syntax::no_index)
        return false;
    report_flow_at_reference(flow, *normal,
                             fmt::format("a fan's or a compressor's power is the actual volume "
                                         "flow through it times {}",
                                         quote(pressure)),
                             side.node);
    return true;
}

// A volume the file says is at the gas's actual state: acfm, Am³, or "actual" in its
// description.
bool checker::names_actual_volume(const symbol_entry& e) {
    if (e.unit_text.find("acf") != std::string_view::npos ||
        e.unit_text.find("Am3") != std::string_view::npos ||
        e.unit_text.find("Am\u00B3") != std::string_view::npos)
        return true;
    // "wet flue gas at stack temperature and pressure", "at line conditions".
    for (const std::string_view words :
         {"actual", "temperature and pressure", "line conditions", "operating conditions",
          "flowing conditions", "stack conditions", "inlet conditions"})
        if (e.description.find(words) != std::string_view::npos)
            return true;
    return false;
}

// "Q_act = r_air*A_f" with r_air in Nm³/(m²·h) and Q_act in m³/h: the same where a side
// is a product, as long as neither holds a pressure, a temperature or a number that could
// correct for the gas's state.
void checker::report_actual_product_as_normal(std::span<const operand> sides) {
    const std::optional<reference_volume> a = reference_volume_of(sides[0].node);
    const std::optional<reference_volume> b = reference_volume_of(sides[1].node);
    if (a.has_value() == b.has_value() || !(a ? a->power == 1 : b->power == 1))
        return;
    const std::size_t normal = a ? 0 : 1;
    const std::size_t actual = 1 - normal;
    if (!only_volumes_and_conversions(sides[actual].node, true) ||
        !only_volumes_and_conversions(sides[normal].node, false) ||
        describes_reference_state(sides[actual].node))
        return;
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("{} is a volume of gas at its actual pressure and temperature and {} one "
                    "at reference conditions ({}): they differ by the gas's state, which this "
                    "formula does not correct for",
                    quote(sides[actual].node), quote(sides[normal].node), (a ? a : b)->name),
        file_.nodes[sides[1].node].range);
    d.level = severity::warning;
    d.notes.push_back({std::string(state_correction_advice), {}});
}

// A product of symbols with no pressure or temperature in them, and numbers that convert
// units only; `volume`: one of the symbols is a volume or a flow declared in a unit.
bool checker::only_volumes_and_conversions(std::uint32_t k, bool volume) const {
    bool found_volume = !volume;
    const bool other = for_each_factor(k, [&](std::uint32_t at, int) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number)
            return !plain_conversion_number(at) && could_correct_state(at);
        if (n.kind != expr_kind::symbol)
            return true;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || !e->compact_dim || e->unit_text.empty() ||
            *e->compact_dim == pressure_dimension() || *e->compact_dim == temperature_dimension())
            return true;
        found_volume = found_volume || is_gas_volume_or_flow(*e->compact_dim);
        return false;
    });
    return !other && found_volume;
}

// A number that could be a correction for a gas's state, (p/p_n)·(T_n/T) folded into one:
// between 0.7 and 1.43 (a plant from 3000 m up to a few bar, from -80 to 120 °C... taken
// as it comes). 0.5886 m³/h to cfm, or 1.699, can be no such thing.
bool checker::could_correct_state(std::uint32_t at) const {
    const double v = written_number(file_.nodes[at].range);
    return v >= 0.7 && v <= 1.43;
}

// A number that only converts units: a power of ten, a time ratio, or a ratio of table
// units (Q_cfm/35.31, ft³ to m³); never one that could be a correction (0.95, 273.15,
// 600 for LNG's expansion).
bool checker::plain_conversion_number(std::uint32_t at) const {
    const double v = written_number(file_.nodes[at].range);
    if (!(v > 0))
        return false;
    const double decade = std::round(std::log10(v));
    if (std::abs(v / std::pow(10.0, decade) - 1.0) < 1e-12)
        return true;
    // A time ratio, also with a power of ten folded in: 0.06 is 60 min/h over 1000 L/m³,
    // 3.6 is 3600 s/h over 1000.
    for (const double time : {60.0, 3600.0, 24.0, 1440.0, 86400.0}) {
        // (Over a power of ten only: LNG's 600, 60 × 10, is a ratio of volumes.)
        const double tens = std::round(std::log10(v / time));
        if ((tens == 0.0 || tens <= -2.0) &&
            std::abs(v / (time * std::pow(10.0, tens)) - 1.0) < 1e-9)
            return true;
    }
    // The inch, foot and yard in metres, exact and printed short (0.0254, 25.4, 0.3048;
    // NIST SP 811 (2008), B.8): lengths, never a state's correction.
    for (const double length : {2.54, 3.048, 9.144}) {
        const double tens = std::round(std::log10(v / length));
        if (std::abs(v / (length * std::pow(10.0, tens)) - 1.0) < 1e-12)
            return true;
    }
    return looks_like_conversion(read_literal(text(file_.nodes[at].range), v, at), false);
}

// A flow at reference conditions where the formula wants the actual one (`wanted` says why):
// the finding of the power, area and velocity rules.
void checker::report_flow_at_reference(std::uint32_t flow, const reference_volume& normal,
                                       std::string_view wanted, std::uint32_t side) {
    diagnostic& d =
        report(rules::unit_scale,
               fmt::format("{} is a flow at reference conditions ({}), but {}: this formula "
                           "does not correct for the gas's state",
                           quote(flow), normal.name, wanted),
               file_.nodes[side].range);
    d.level = severity::warning;
    d.notes.push_back({std::string(state_correction_advice), {}});
}

// "A_cl = Q_s/AC": a filter's cloth area or a duct's section from a flow at reference
// conditions over a face velocity (an air-to-cloth ratio), where the velocity is the actual
// flow's over the area (EPA Air Pollution Control Cost Manual, 6th ed., ch. 5.1, from
// memory); v = Q/A the other way round is report_velocity_from_normal_flow's.
bool checker::report_area_from_normal_flow(const operand& side) {
    std::uint32_t flow = syntax::no_index;
    std::optional<reference_volume> normal;
    int velocities = 0;
    bool other = false;
    for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number) {
            other = other || !plain_conversion_number(at);
            return false;
        }
        const symbol_entry* e =
            n.kind == expr_kind::symbol ? symbols_.find(text(n.range)) : nullptr;
        if (e == nullptr || !e->compact_dim) {
            other = true;
            return false;
        }
        if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0 && sign > 0 &&
            flow == syntax::no_index) {
            flow = at;
            normal = stated_reference_volume(*e);
        } else if (*e->compact_dim == velocity_dim && sign < 0) {
            ++velocities;
        } else {
            other = true; // a pressure or temperature ratio, or anything else
        }
        return false;
    });
    if (other || velocities != 1 || flow == syntax::no_index || !normal || normal->power != 1)
        return false;
    report_flow_at_reference(flow, *normal,
                             "the area a gas passes at a velocity is its actual volume flow "
                             "over that velocity",
                             side.node);
    return true;
}

// "v = 353.7*Q/D_mm^2" in m/s from m³/h: 4/π × 10⁶/3600, a circle's area folded with the
// conversions (common practice); beside a π written out, 4e6 is 4 × 10⁶.
bool checker::circle_folded_with_conversion(std::uint32_t at, bool pi_written) const {
    const scale_literal l = read_number(text(file_.nodes[at].range)).literal;
    if (!(l.value > 0.0))
        return false;
    const double slack = std::max(l.tolerance, 1e-9);
    const double folded = pi_written ? l.value / 4.0 : l.value * std::numbers::pi / 4.0;
    for (const double time : {1.0, 60.0, 3600.0, 86400.0})
        for (const double ratio : {folded * time, folded / time}) {
            const double decade = std::pow(10.0, std::round(std::log10(ratio)));
            if (std::abs(ratio / decade - 1.0) <= slack)
                return true;
        }
    return false;
}

// "t_fill = V_u/Q_cn*60" with V_u in Sm³ and Q_cn in Nm³/h: gas volumes at two reference
// states in a ratio count a standard cubic metre as a normal one, 5.5 % apart (1 Nm³ =
// 1.0549 Sm³, ISO 13443, from memory). Asked where the product holds one of each, above
// and below, and no number but plain conversions.
bool checker::report_reference_states_in_ratio(const operand& side) {
    std::uint32_t above = syntax::no_index;
    std::uint32_t below = syntax::no_index;
    std::optional<reference_volume> top;
    std::optional<reference_volume> bottom;
    bool other = false;
    // One gas volume in the product above and one below; a second on one side is no ratio.
    const auto place = [&](std::uint32_t at, int sign, const std::optional<reference_volume>& v) {
        if (!v || std::abs(v->power) != 1)
            return other = true;
        const bool up = v->power * sign > 0;
        if ((up ? above : below) != syntax::no_index)
            return other = true;
        (up ? above : below) = at;
        (up ? top : bottom) = v;
        return false;
    };
    for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number) {
            other = other || !plain_conversion_number(at);
            return false;
        }
        // A workbook's cell: "=C30*24*C38/1000" with C30 in Nm³/h and C38 in MJ/Sm³.
        if (n.kind == expr_kind::reference) {
            const syntax::reference_value& r = file_.references[n.lhs];
            if ((unit_marks_of(r.unit_text) & at_reference_conditions) == 0) {
                other = other || (r.dim && (compact_dimension(*r.dim) == pressure_dimension() ||
                                            compact_dimension(*r.dim) == temperature_dimension()));
                return false;
            }
            return place(at, sign, reference_volume_in(r.unit_text));
        }
        if (n.kind != expr_kind::symbol)
            return false;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e == nullptr || (unit_marks_of(e->unit_text) & at_reference_conditions) == 0) {
            other = other || (e != nullptr && e->compact_dim &&
                              (*e->compact_dim == pressure_dimension() ||
                               *e->compact_dim == temperature_dimension()));
            return false;
        }
        return place(at, sign, stated_reference_volume(*e));
    });
    if (other || above == syntax::no_index || below == syntax::no_index ||
        std::abs(top->kelvins / bottom->kelvins - 1.0) <= reference_temperature_slack)
        return false;
    diagnostic& d =
        report(rules::unit_scale,
               fmt::format("{} is gas at {} and {} gas at {}: their ratio counts the one as the "
                           "other, {:.1f} % apart, which this formula does not correct for",
                           quote(above), top->name, quote(below), bottom->name,
                           std::abs(top->kelvins / bottom->kelvins - 1.0) * 100.0),
               file_.nodes[side.node].range);
    d.level = severity::warning;
    d.notes.push_back({"at one pressure a gas's volume follows its absolute temperature: 1 "
                       "Nm\u00B3 (0 \u00B0C) = 1.0549 Sm\u00B3 (15 \u00B0C) = 37.33 scf "
                       "(60 \u00B0F), all at 101.325 kPa",
                       {}});
    return true;
}

// "V_d = Q_n/(3600*A_d)" with Q_n in Nm³/h: a gas's velocity in a duct is its actual
// volume flow over the area; the normal flow leaves out its state (2.3 times at a smelter's
// 350 °C off-gas). Asked of a product of one flow at reference conditions over an area,
// with no temperature or pressure beside them that could correct it.
bool checker::report_velocity_from_normal_flow(const operand& side) {
    std::optional<reference_volume> normal;
    std::uint32_t flow = syntax::no_index;
    bool correction = false;
    const bool circle = holds_pi(side.node);
    for_each_factor(side.node, [&](std::uint32_t at, int sign) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::number) {
            // The 4 of 4·Q/(π·D²) is the circle's.
            const double v = written_number(n.range);
            correction =
                correction || !(plain_conversion_number(at) || (circle && (v == 4.0 || v == 2.0)) ||
                                circle_folded_with_conversion(at, circle));
            return false;
        }
        // D^2, (D_mm/1000)^2: a power of a symbol, or of a symbol over a conversion, is
        // read as the symbol.
        std::uint32_t base = at;
        if (n.kind == expr_kind::power) {
            const std::uint32_t inner = syntax::inside_brackets(file_, n.lhs);
            const syntax::expr_node& in = file_.nodes[inner];
            // (0.0254*d_in)^2: the conversion written first, as a factor.
            const bool number_first =
                in.kind == expr_kind::multiply && file_.nodes[in.lhs].kind == expr_kind::number;
            const std::uint32_t symbol = number_first ? in.rhs : in.lhs;
            const std::uint32_t number = number_first ? in.lhs : in.rhs;
            if (in.kind == expr_kind::symbol)
                base = inner;
            else if ((in.kind == expr_kind::divide || in.kind == expr_kind::multiply) &&
                     file_.nodes[symbol].kind == expr_kind::symbol &&
                     file_.nodes[number].kind == expr_kind::number &&
                     plain_conversion_number(number))
                base = symbol;
        }
        // "(V_a + V_n)/(3600*A)": air and fuel gas in Nm³/h added, as if they were the
        // flue gas at its temperature.
        if (n.kind == expr_kind::add || n.kind == expr_kind::subtract) {
            const std::optional<reference_volume> v = reference_volume_of_sum(at);
            if (!v || sign != 1 || flow != syntax::no_index)
                correction = true;
            flow = at;
            normal = v;
            return false;
        }
        if (file_.nodes[base].kind != expr_kind::symbol) {
            correction = correction || n.kind != expr_kind::pi;
            return false;
        }
        const symbol_entry* e = symbols_.find(text(file_.nodes[base].range));
        if (e == nullptr || !e->compact_dim)
            return false;
        if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0) {
            const std::optional<reference_volume> v = stated_reference_volume(*e);
            if (flow != syntax::no_index || base != at || !v || v->power * sign != 1)
                correction = true; // two, or a volume at reference conditions below
            flow = at;
            normal = v;
        } else if (*e->compact_dim == pressure_dimension() ||
                   *e->compact_dim == temperature_dimension() || e->compact_dim->is_dimensionless())
            correction = true;
        return false;
    });
    if (correction || flow == syntax::no_index || !normal)
        return false;
    report_flow_at_reference(flow, *normal,
                             "a gas's velocity is its actual volume flow over the area", side.node);
    return true;
}

} // namespace plumb::formula_check
