// Moist air's enthalpy on the two charts: the SI chart counts dry air from 0 °C, the I-P
// chart from 0 °F (ASHRAE Handbook—Fundamentals, ch. 1, from memory: h = 1.006·t + W·(2501
// + 1.86·t) kJ/kg with t in °C, h = 0.240·t + W·(1061 + 0.444·t) Btu/lb with t in °F). At
// 0 °F the SI chart reads 1.006 × (−17.78) = −17.88 kJ/kg, so a reading converts as
// h_IP = h_SI/2.326 + 7.687 Btu/lb, and only a difference converts by 2.326 alone.
#include "check/formula/checker.hpp"
#include "model/ascii_case.hpp"
#include "model/difference_name.hpp"
#include "plumb/rules.hpp"

#include <cmath>
#include <fmt/format.h>

namespace plumb::formula_check {

namespace {
constexpr double btu_per_lb = 2326.0;             // J/kg (NIST SP 811 (2008), B.8, Btu_IT/lb)
constexpr double datum_si = 17.88e3;              // J/kg between the two zeros, dry air
constexpr double datum_ip = 17.88e3 / btu_per_lb; // 7.687 Btu/lb
} // namespace

// A symbol declared as moist air's enthalpy: a specific energy in Btu/lb or J/kg whose name
// or words say enthalpy and, where `said_air`, whose words say air; never one whose words say
// water, steam or a refrigerant, whose tables share one zero in both systems.
const symbol_entry* checker::air_enthalpy_symbol(std::uint32_t node, bool said_air) const {
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, node)];
    if (n.kind != expr_kind::symbol)
        return nullptr;
    const std::string_view name = text(n.range);
    const symbol_entry* e = symbols_.find(name);
    if (e == nullptr || !e->compact_dim || *e->compact_dim != velocity_squared_dim ||
        (e->unit_text.find("Btu/lb") == std::string_view::npos &&
         e->unit_text.find("J/kg") == std::string_view::npos))
        return nullptr;
    // A difference of enthalpies (Δh across a coil) converts by the factor alone.
    if (names_a_difference(name, e->description))
        return nullptr;
    const std::string words = lower_ascii(e->description);
    // Air by name, or by the places an air handler's enthalpies are taken.
    bool air = !said_air || words.starts_with("air");
    for (const std::string_view place :
         {" air", "psychrometric", "outdoor", "room", "supply", "return", "mixed"})
        air = air || words.find(place) != std::string::npos;
    const bool enthalpy = words.find("enthalpy") != std::string::npos || name.starts_with("h");
    for (const std::string_view other :
         {"water", "steam", "refrigerant", "vapour", "vapor", "liquid", "ammonia", "brine"})
        if (words.find(other) != std::string::npos)
            return nullptr;
    return air && enthalpy ? e : nullptr;
}

// "h_oI = h_o/2.326 + 7.68": the number between the charts' zeros, in the sum's unit, is a
// quantity, as the atmosphere beside a column's pressure is.
bool checker::read_air_enthalpy_datum(std::size_t base) {
    const std::size_t count = operands_.size() - base;
    std::size_t number = count;
    double unit = std::numeric_limits<double>::quiet_NaN();
    for (std::size_t i = 0; i < count; ++i) {
        const operand& op = operands_[base + i];
        const typed_term& t = op.type;
        if (!t.known)
            return false;
        if (t.numeric) {
            if (number != count || t.literal_count != 1)
                return false;
            number = i;
            continue;
        }
        if (t.dim != velocity_squared_dim)
            return false;
        const bool holds_air = for_each_factor(op.node, [&](std::uint32_t at, int) {
            return air_enthalpy_symbol(at, true) != nullptr;
        });
        const double u = unit_as_written(t);
        if (!holds_air || !std::isfinite(u) ||
            (std::isfinite(unit) && std::abs(u / unit - 1.0) > 2e-3))
            return false;
        unit = u;
    }
    if (number == count || !std::isfinite(unit))
        return false;
    auto& t =
        const_cast<typed_term&>(operands_[base + number].type); // as the atmosphere's reading does
    scale_literal& l = literals_[t.literal_begin];
    const double joules = l.value * unit;
    if (l.exponent != 1.0 || std::abs(joules / datum_si - 1.0) > 2e-3)
        return false;
    const std::uint32_t node = l.node;
    t.dim = velocity_squared_dim;
    t.scale = unit;
    t.exact_scale.reset();
    t.numeric = false;
    t.value.reset();
    read_as_quantity(l);
    diagnostic& d = report(
        rules::trade_constant,
        fmt::format("'{}' is read as the step between moist air's two zeros, dry air at 0 \u00B0C "
                    "and at 0 \u00B0F: {} kJ/kg, {} Btu/lb",
                    display_text(file_.nodes[node].range), format_factor(datum_si / 1000.0),
                    format_factor(std::round(datum_ip * 1000.0) / 1000.0)),
        file_.nodes[node].range);
    d.level = severity::note;
    d.notes.push_back({"write it with its unit (7.687 {Btu/lb} or 17.88 {kJ/kg}) to say so", {}});
    return true;
}

// "h_oI = h_o/2.326": moist air's enthalpy read off one chart and converted by the factor
// alone to the other, whose zero is 17.88 kJ/kg (7.687 Btu/lb) away.
void checker::report_air_enthalpy_datum_left_out(std::span<const operand> sides) {
    const auto sole = [&](std::uint32_t k) -> const symbol_entry* {
        const std::uint32_t at = sole_symbol_times_numbers(k);
        return at != syntax::no_index ? air_enthalpy_symbol(at, false) : nullptr;
    };
    const symbol_entry* a = sole(sides[0].node);
    const symbol_entry* b = sole(sides[1].node);
    // One of the two said to be air's ("the same enthalpies, US sheet" beside the outdoor air's).
    const auto said_air = [&](std::uint32_t k) {
        return for_each_factor(
            k, [&](std::uint32_t at, int) { return air_enthalpy_symbol(at, true) != nullptr; });
    };
    if (a == nullptr || b == nullptr || !(said_air(sides[0].node) || said_air(sides[1].node)))
        return;
    const bool a_ip = a->unit_text.find("Btu/lb") != std::string_view::npos;
    const bool b_ip = b->unit_text.find("Btu/lb") != std::string_view::npos;
    if (a_ip == b_ip)
        return;
    const operand& si = a_ip ? sides[1] : sides[0];
    const operand& ip = a_ip ? sides[0] : sides[1];
    diagnostic& d = report(
        rules::offset_scale,
        fmt::format("{} and {} are moist air's enthalpies, which the I-P chart counts from dry air "
                    "at 0 \u00B0F and the SI chart from 0 \u00B0C: converted by the factor alone, "
                    "a reading is off by 7.687 Btu/lb (17.88 kJ/kg)",
                    quote(ip.node), quote(si.node)),
        file_.nodes[sides[1].node].range);
    d.level = severity::warning;
    add_term(d, sides[0]);
    add_term(d, sides[1], true);
    const bool ip_alone =
        file_.nodes[syntax::inside_brackets(file_, ip.node)].kind == expr_kind::symbol;
    d.notes.push_back(
        {ip_alone ? fmt::format("write ({} + 7.687 {{Btu/lb}}); a difference of enthalpies "
                                "converts by 2.326 alone",
                                display_text(file_.nodes[si.node].range))
                  : fmt::format("write ({} - 17.88 {{kJ/kg}}); a difference of enthalpies "
                                "converts by 2.326 alone",
                                display_text(file_.nodes[ip.node].range)),
         {}});
}

// "h = 1.006*t + W*(2501 + 1.86*t)" with h in kJ/kg and t in °C, or its I-P twin in Btu/lb
// and °F: the chart's formula typed with its numbers bare, which carry kJ/(kg·K) and kJ/kg
// and count t from the chart's zero. Multiplied out (in any order, W in kg/kg, g/kg or gr/lb)
// into a term in t, one in W and one in W·t, each number is weighed in SI units against the
// published ones; a reading on the other chart's scale, or an enthalpy in J/kg beside
// kJ/kg numbers, matches neither and is checked as any formula is.
bool checker::read_moist_air_enthalpy_fit(const syntax::formula& f) {
    if (f.side_count != 2 ||
        file_.sides[f.first_side + 1].relation_before != syntax::relation_kind::equal)
        return false;
    const std::uint32_t right = syntax::inside_brackets(file_, file_.sides[f.first_side + 1].root);
    const expr_kind shape = file_.nodes[right].kind;
    if (shape != expr_kind::add && shape != expr_kind::subtract)
        return false;
    const syntax::expr_node& left =
        file_.nodes[syntax::inside_brackets(file_, file_.sides[f.first_side].root)];
    if (left.kind != expr_kind::symbol)
        return false;
    // Asked of every sum: the latent heat's digits (2501, 2500, 1061) before any lookup.
    const std::string_view written = text(file_.nodes[right].range);
    if (written.find("250") == std::string_view::npos &&
        written.find("106") == std::string_view::npos)
        return false;
    const symbol_entry* h = symbols_.find(text(left.range));
    if (h == nullptr || !h->compact_dim || *h->compact_dim != velocity_squared_dim ||
        h->offset_unit != nullptr)
        return false;
    expansion terms;
    if (!expand(right, terms) || terms.size() != 3)
        return false;
    const auto entry = [&](std::uint32_t node) {
        return symbols_.find(text(file_.nodes[node].range));
    };
    const symbol_entry* reading = nullptr;
    const symbol_entry* ratio = nullptr;
    double dry = 0.0;
    double latent = 0.0;
    double vapour = 0.0;
    for (const expanded_term& t : terms) {
        if (t.count != 1 || file_.nodes[t.symbols[0]].kind != expr_kind::symbol)
            continue;
        const symbol_entry* e = entry(t.symbols[0]);
        if (e == nullptr || !e->compact_dim)
            return false;
        if (e->offset_unit != nullptr && *e->compact_dim == temperature_dimension()) {
            reading = e;
            dry = t.coefficient;
        } else if (e->offset_unit == nullptr && e->compact_dim->is_dimensionless()) {
            ratio = e;
            latent = t.coefficient;
        }
    }
    if (reading == nullptr || ratio == nullptr)
        return false;
    for (const expanded_term& t : terms) {
        if (t.count != 2)
            continue;
        const symbol_entry* a = entry(t.symbols[0]);
        const symbol_entry* b = entry(t.symbols[1]);
        if ((a == reading && b == ratio) || (a == ratio && b == reading))
            vapour = t.coefficient;
    }
    // J/kg for each unit of the enthalpy, and per kelvin for each degree of the reading.
    const double per_degree = h->si_factor / reading->offset_unit->factor;
    const bool celsius = std::abs(reading->offset_unit->offset - 273.15) < 1e-9 &&
                         reading->offset_unit->factor == 1.0;
    const bool fahrenheit = std::abs(reading->offset_unit->offset - 255.372222) < 1e-3 &&
                            std::abs(reading->offset_unit->factor - 5.0 / 9.0) < 1e-9;
    const double dry_si = dry * per_degree;
    const double latent_si = latent * h->si_factor / ratio->si_factor;
    const double vapour_si = vapour * per_degree / ratio->si_factor;
    // 1.005 to 1.006 kJ/(kg·K) for dry air (0.240 Btu/(lb·°F)), 1.805 to 1.88 for the vapour
    // (0.444 to 0.45), 2501 kJ/kg over liquid water at 0 °C, and 1061 Btu/lb at 0 °F over
    // liquid water at 32 °F, which is 2468 kJ/kg.
    const bool dry_air = dry_si >= 995.0 && dry_si <= 1010.0;
    const bool vapour_heat = vapour_si >= 1800.0 && vapour_si <= 1900.0;
    const bool si_chart = celsius && latent_si >= 2.495e6 && latent_si <= 2.505e6;
    const bool ip_chart = fahrenheit && latent_si >= 2.460e6 && latent_si <= 2.475e6;
    if (!dry_air || !vapour_heat || !(si_chart || ip_chart))
        return report_moist_air_enthalpy_units(right, *h, *reading, *ratio, dry, latent);
    diagnostic& d = report(
        rules::trade_constant,
        si_chart
            ? std::string("read as moist air's enthalpy on the SI chart, h = 1.006\u00B7t "
                          "+ W\u00B7(2501 + 1.86\u00B7t) kJ/kg with t in \u00B0C: its numbers "
                          "carry kJ/(kg\u00B7K) and kJ/kg, and t counts from the chart's "
                          "0 \u00B0C")
            : std::string("read as moist air's enthalpy on the I-P chart, h = 0.240\u00B7t "
                          "+ W\u00B7(1061 + 0.444\u00B7t) Btu/lb with t in \u00B0F: its numbers "
                          "carry Btu/(lb\u00B7\u00B0F) and Btu/lb, and t counts from the "
                          "chart's 0 \u00B0F"),
        file_.nodes[right].range);
    d.level = severity::note;
    d.notes.push_back({"ASHRAE Handbook\u2014Fundamentals, ch. 1 (psychrometrics); the same "
                       "numbers on the other chart's scale, or in another unit of enthalpy, "
                       "would be a finding",
                       {}});
    return true;
}

// The chart's formula typed as printed, its numbers those of one chart, with an input in
// another unit: said as such, where the reading's scale alone would advise accepting a fit.
bool checker::report_moist_air_enthalpy_units(std::uint32_t right, const symbol_entry& h,
                                              const symbol_entry& reading,
                                              const symbol_entry& ratio, double dry,
                                              double latent) {
    const auto near = [](double x, double c) { return std::abs(x / c - 1.0) < 0.002; };
    const bool si_numbers = dry >= 0.995 && dry <= 1.01 &&
                            (near(latent, 2501.0) || near(latent / ratio.si_factor, 2501.0));
    const bool ip_numbers = dry >= 0.238 && dry <= 0.242 &&
                            (near(latent, 1061.0) || near(latent / ratio.si_factor, 1061.0));
    if (!si_numbers && !ip_numbers)
        return false;
    const bool celsius = is_celsius(reading.offset_unit);
    const bool fahrenheit = std::abs(reading.offset_unit->factor - 5.0 / 9.0) < 1e-9;
    std::string why;
    const auto add = [&](std::string part) { why += (why.empty() ? "" : "; ") + part; };
    if (si_numbers ? !celsius : !fahrenheit)
        add(fmt::format("the reading is in {}, where the chart counts from 0 {}",
                        reading.offset_unit->symbol, si_numbers ? "\u00B0C" : "\u00B0F"));
    if (!near(h.si_factor, si_numbers ? 1000.0 : btu_per_lb))
        add(fmt::format("the enthalpy is in {}, where the numbers give {}", h.unit_text,
                        si_numbers ? "kJ/kg" : "Btu/lb"));
    if (!near(latent / ratio.si_factor, si_numbers ? 2501.0 : 1061.0))
        add(fmt::format("the humidity ratio is in {}, where the numbers take {} (divide it by "
                        "{:g})",
                        ratio.unit_text, si_numbers ? "kg/kg" : "lb/lb", 1.0 / ratio.si_factor));
    if (why.empty())
        return false;
    diagnostic& d = report(
        rules::offset_scale,
        fmt::format("this is moist air's enthalpy on the {} chart, {}, but {}",
                    si_numbers ? "SI" : "I-P",
                    si_numbers ? "h = 1.006\u00B7t + W\u00B7(2501 + 1.86\u00B7t) kJ/kg with t in "
                                 "\u00B0C"
                               : "h = 0.240\u00B7t + W\u00B7(1061 + 0.444\u00B7t) Btu/lb with t "
                                 "in \u00B0F",
                    why),
        file_.nodes[right].range);
    if (si_numbers ? celsius : fahrenheit) { // the sizes of units alone, as any such finding
        d.rule = std::string(rules::unit_scale);
        d.level = severity::warning;
    }
    d.notes.push_back({"ASHRAE Handbook\u2014Fundamentals, ch. 1 (psychrometrics): each chart's "
                       "numbers hold only in its own units and from its own zero",
                       {}});
    return true;
}

} // namespace plumb::formula_check
