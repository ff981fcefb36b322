// The findings of sums of readings: an atmosphere taken twice or at sea level for a site, a
// scale's zero added twice or in another unit, scales mixed in one sum.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// The site's barometer, where the file declares one that is not the standard atmosphere:
// "p_b : kPa "site barometric pressure, 96.2 kPa"" or "p_atm : psia = 12.2". Worked out at
// the first gauge reading made absolute with a number, once per file.
// A barometer read at a site, up a mountain or down a mine, and not the sea level's within its
// rounding.
static bool a_site_barometer(double pascals) {
    return (pascals >= highest_site_atmosphere * standard_atmosphere &&
            pascals <= (1.0 - site_barometer_slack_in_difference) * standard_atmosphere) ||
           (pascals >= 1.005 * standard_atmosphere &&
            pascals <= deepest_site_atmosphere * standard_atmosphere);
}

const checker::site_barometer* checker::declared_site_barometer() {
    // A file is checked as it is read: the declarations that came since the last search are
    // searched too, each once, so that a barometer declared after an early formula counts.
    if (!site_barometer_.name.empty())
        return &site_barometer_;
    if (site_barometer_settled_)
        return nullptr;
    if (file_.barometer) {
        site_barometer_settled_ = true;
        const double pascals = file_.barometer->pascals;
        if (!a_site_barometer(pascals))
            return nullptr;
        site_barometer_ = {file_.barometer->cell, pascals, file_.barometer->unit};
        return &site_barometer_;
    }
    for (; site_barometer_declarations_ < file_.declarations.size();
         ++site_barometer_declarations_) {
        const syntax::declaration& decl = file_.declarations[site_barometer_declarations_];
        if (!decl.kind.dim || decl.name_count == 0 ||
            (decl.kind.single_unit != nullptr && decl.kind.single_unit->offset != 0.0))
            continue;
        const std::optional<compact_dimension> dim = compact_dimension::fitted(*decl.kind.dim);
        if (!dim || !(*dim == pressure_dimension()))
            continue;
        if (!names_a_site_barometer(text(file_.names[decl.first_name].name),
                                    text(decl.description)))
            continue;
        const std::string_view name = text(file_.names[decl.first_name].name);
        const double written = declared_number(decl);
        const double pascals = written * decl.kind.si_factor;
        // The file's atmosphere is the sea level's: no site barometer to hold sums to.
        if (pascals > (1.0 - site_barometer_slack_in_difference) * standard_atmosphere &&
            pascals <= 1.005 * standard_atmosphere) {
            site_barometer_settled_ = true;
            return nullptr;
        }
        // A site below sea level by more than the Dead Sea is no site; above 5200 m the air
        // is thinner than any plant is built in (the highest mines and observatories; the
        // standard atmosphere, from memory, has 52.7 kPa there).
        if (!a_site_barometer(pascals))
            continue;
        site_barometer_ = {name, pascals, decl.kind.si_factor};
        return &site_barometer_;
    }
    return nullptr;
}

// The value a declaration gives, after its `=` or in its description beside its unit
// ("..., 96.2 kPa"); NaN where it gives none.
double checker::declared_number(const syntax::declaration& decl) const {
    constexpr double none = std::numeric_limits<double>::quiet_NaN();
    if (decl.value.end > decl.value.begin)
        return written_number(decl.value);
    const std::string_view description = text(decl.description);
    const std::string_view unit = text(decl.spec);
    if (unit.empty())
        return none;
    for (std::size_t at = description.find(unit); at != std::string_view::npos;
         at = description.find(unit, at + 1)) {
        std::size_t end = at;
        while (end > 0 && description[end - 1] == ' ')
            --end;
        std::size_t begin = end;
        while (begin > 0 && (std::isdigit(static_cast<unsigned char>(description[begin - 1])) ||
                             description[begin - 1] == '.'))
            --begin;
        // "14.3 psia" beside a unit declared psi: the a marks the reading absolute.
        std::size_t after = at + unit.size();
        if (after < description.size() && description[after] == 'a')
            ++after;
        const bool unit_ends = after == description.size() ||
                               !std::isalnum(static_cast<unsigned char>(description[after]));
        if (begin < end && unit_ends &&
            std::isdigit(static_cast<unsigned char>(description[begin])))
            return std::strtod(std::string(description.substr(begin, end - begin)).c_str(),
                               nullptr);
    }
    return none;
}

// "p_g + 101.325" in a file that declares the site's barometer at 96.2 kPa: the gauge
// reading is made absolute with the sea-level atmosphere, several kPa off at the site.
void checker::warn_sea_level_atmosphere_at_site(std::span<const operand> terms, double unit) {
    for (const auto& t : terms) {
        if (!is_shift_candidate(t) || t.subtracted)
            continue;
        const shift sh = shift_of(t);
        const double added = sh.si + sh.written * unit;
        if (std::abs(added / standard_atmosphere - 1.0) > 0.015)
            continue;
        // "p_g + p_b + 14.7": the barometer is there already.
        const auto barometer = std::find_if(terms.begin(), terms.end(), [&](const operand& o) {
            return !o.subtracted && !is_shift_candidate(o) && names_atmosphere(o.node);
        });
        if (barometer != terms.end()) {
            diagnostic& d = report(rules::offset_scale,
                                   fmt::format("{} and {} both add the atmosphere: the result is "
                                               "one atmosphere above the absolute pressure",
                                               quote(barometer->node), quote(t.node)),
                                   file_.nodes[t.node].range);
            add_term(d, *barometer);
            add_number_term(d, t, barometer->type.dim);
            d.notes.push_back({"a gauge reading plus the atmosphere is absolute; add it once", {}});
            return;
        }
        const site_barometer* site = declared_site_barometer();
        if (site == nullptr || std::abs(added / site->pascals - 1.0) <= site_barometer_slack)
            return;
        report_atmosphere_not_the_site(t.node, "the atmosphere at sea level", added, *site, unit);
        return;
    }
}

// "p_g + 101.325", "p_g + 14.73" in a file that declares the site's barometer: an
// atmosphere added to a gauge reading that is not the site's (see site_barometer_slack).
void checker::report_atmosphere_not_the_site(std::uint32_t number, std::string_view what,
                                             double pascals, const site_barometer& site,
                                             double unit, bool added_to_gauge,
                                             bool number_subtracted) {
    const double height = 44330.8 * (1.0 - std::pow(site.pascals / standard_atmosphere, 0.190263));
    // "p_pz - 101.325": taken from an absolute reading, too large an atmosphere leaves the
    // pressure above it too small; added to a gauge reading, the absolute one too large.
    const double off = (pascals - site.pascals) * (number_subtracted ? -1.0 : 1.0);
    // In the sum's unit where it is one the trades name (12.7 psi, 2.0 psi high in a psi
    // calc), else in kPa.
    std::string_view shown = "kPa";
    double shown_pascals = 1000.0;
    for (const pressure_unit& u : pressure_units)
        if (std::isfinite(unit) && unit > 0.0 && std::abs(unit / u.pascals - 1.0) < 5e-3 &&
            u.name != "Pa" && u.name != "MPa") {
            shown = u.name;
            shown_pascals = u.pascals;
        }
    const auto in_shown = [&](double p, int digits) {
        return format_factor(rounded_to_digits(p / shown_pascals, digits));
    };
    diagnostic& d =
        report(rules::offset_scale,
               fmt::format("{} is {}, but this file declares the site's barometer '{}' ({} {}, "
                           "the standard atmosphere's about {} m {}): {} comes out {} {} {}",
                           display_text(file_.nodes[number].range), what,
                           barometer_in_unit(unit).value_or(site.name), in_shown(site.pascals, 4),
                           shown, static_cast<long>(std::round(std::abs(height) / 10.0) * 10),
                           height >= 0.0 ? "up" : "below sea level",
                           added_to_gauge      ? "the absolute pressure"
                           : number_subtracted ? "the pressure above the atmosphere"
                                               : "the sum it stands in",
                           shown == "kPa" ? format_factor(std::round(std::abs(off) / 100.0) / 10.0)
                                          : in_shown(std::abs(off), 2),
                           shown, off > 0 ? "high" : "low"),
               file_.nodes[number].range);
    d.level = severity::warning;
    // "p_psia = p_psig + 14.696" with the barometer declared in kPa: the name alone would add
    // kilopascals to psi; the barometer's value in the sum's unit is given with it.
    std::string barometer;
    std::string converted;
    if (const auto name = barometer_in_unit(unit)) {
        barometer = std::string(*name);
    } else if (!(unit > 0.0) || !std::isfinite(unit) || std::abs(site.unit / unit - 1.0) < 5e-3) {
        // "14.696 + p_gas/27.7": the sum is in psi through a rounded 27.7 in. w.c. per psi.
        barometer = std::string(site.name);
    } else {
        barometer = format_factor(site.pascals / unit);
        converted = fmt::format(", '{}' in the sum's unit", site.name);
    }
    d.notes.push_back(
        {added_to_gauge
             ? fmt::format("a gauge reading plus the local atmosphere is absolute: write (... + "
                           "{}){}",
                           barometer, converted)
             : fmt::format("the atmosphere where the reading is taken is the site's: write {} "
                           "in place of {}{}",
                           barometer, display_text(file_.nodes[number].range), converted),
         {}});
}

// "(101.325 - p_v)*1000/(ρ*g)", an NPSH from an open sump, and "p_pz - 101.325", an absolute
// piezometer made gauge: the sea-level atmosphere written as a number beside absolute
// readings, in a file that declares its site's barometer.
void checker::warn_atmosphere_number_at_site(std::span<const operand> terms, double unit) {
    // The number and an absolute reading on opposite sides of the sum: "p_abs + 101.325" is
    // the atmosphere added twice, another rule's finding.
    const auto absolute_reading = [&](bool subtracted) {
        return std::any_of(terms.begin(), terms.end(), [&](const operand& t) {
            return !is_shift_candidate(t) && t.subtracted == subtracted && t.type.known &&
                   !t.type.numeric && t.type.offset == nullptr &&
                   t.type.dim == pressure_dimension();
        });
    };
    for (const auto& t : terms) {
        if (!is_shift_candidate(t) || !absolute_reading(!t.subtracted))
            continue;
        const shift sh = shift_of(t);
        const double written = std::abs(sh.si + sh.written * unit);
        if (std::abs(written / standard_atmosphere - 1.0) > 0.015)
            continue;
        const site_barometer* site = declared_site_barometer();
        if (site == nullptr ||
            std::abs(written / site->pascals - 1.0) <= site_barometer_slack_in_difference)
            return;
        report_atmosphere_not_the_site(t.node, "the atmosphere at sea level", written, *site, unit,
                                       false, t.subtracted);
        return;
    }
}

// What to add to a gauge reading in `unit` to make it absolute: the barometer declared in
// that unit, or the words for it (a symbol in another unit would be the next slip).
std::string checker::atmosphere_in(double unit, std::string_view unit_name) const {
    if (std::optional<std::string> barometer = barometer_converted_to(unit))
        return std::move(*barometer);
    return fmt::format("the atmospheric pressure in {}", unit_name);
}

// "p_barg = p_a/14.504" where the file declares its site's barometer, 13.5 psia: what makes
// the reading absolute is that barometer, in the reading's unit, never the sea level's 1.01325.
// Empty where the file declares no site barometer.
std::optional<std::string> checker::site_atmosphere_advice(std::string_view reading, double unit,
                                                           std::string_view unit_name) {
    const site_barometer* site = declared_site_barometer();
    if (site == nullptr)
        return std::nullopt;
    if (std::isfinite(unit)) {
        std::optional<std::string_view> name = barometer_in_unit(unit);
        if (!name && std::abs(site->unit / unit - 1.0) < 1e-9)
            name = site->name;
        if (name)
            return fmt::format("a gauge reading plus the site's barometer is absolute: write "
                               "({} + {})",
                               reading, *name);
    }
    if (!std::isfinite(unit) || unit <= 0.0)
        return fmt::format("a gauge reading plus the site's barometer '{}' is absolute",
                           site->name);
    return fmt::format("a gauge reading plus the site's barometer is absolute: write ({} + {}), "
                       "'{}' in {}",
                       reading, format_factor(site->pascals / unit), site->name, unit_name);
}

// "p_bk : kPa "site barometric pressure"" beside "p_bar : inHg ...": the barometer the
// advice names is the one declared in the sum's unit, where the file declares one.
std::optional<std::string_view> checker::barometer_in_unit(double unit) const {
    // The site's barometer itself, where it was found and is in that unit.
    if (!site_barometer_.name.empty() && std::isfinite(unit) && unit > 0.0 &&
        std::abs(site_barometer_.unit / unit - 1.0) < 1e-9 && !file_.barometer)
        return site_barometer_.name;
    for (const syntax::declaration& decl : file_.declarations)
        if (std::abs(decl.kind.si_factor / unit - 1.0) <= 1e-9 && declares_a_barometer(decl))
            return text(file_.names[decl.first_name].name);
    return std::nullopt;
}

// A declaration of one pressure symbol that is the barometer: named for the atmosphere or
// described as the barometer or the atmospheric pressure.
bool checker::declares_a_barometer(const syntax::declaration& decl) const {
    if (!decl.kind.dim || decl.name_count != 1 ||
        (decl.kind.single_unit != nullptr && decl.kind.single_unit->offset != 0.0))
        return false;
    const std::optional<compact_dimension> dim = compact_dimension::fitted(*decl.kind.dim);
    const std::string_view name = text(file_.names[decl.first_name].name);
    const std::string_view description = text(decl.description);
    // A differential "vented to atmosphere" names it but is none.
    const bool differential = name.starts_with("\u0394") || name.starts_with("d") ||
                              description.find("differential") != std::string_view::npos ||
                              description.find("drop") != std::string_view::npos;
    // Named for it, or described as the barometer or the atmospheric pressure; not a
    // pressure described as some reading "plus the atmosphere".
    // Not a name alone where the words call it some other pressure ("P_atm : atm
    // "saturator pressure, absolute, in atmospheres"").
    const bool described = description.find("barometr") != std::string_view::npos ||
                           description.find("barometer") != std::string_view::npos ||
                           description.find("atmospheric pressure") != std::string_view::npos ||
                           description.find("ambient pressure") != std::string_view::npos;
    const bool barometer = described || (names_the_atmosphere(name, {}) &&
                                         description.find("pressure") == std::string_view::npos);
    return dim && *dim == pressure_dimension() && barometer && !differential &&
           description.find("standard") == std::string_view::npos &&
           description.find("gauge") == std::string_view::npos &&
           description.find("below") == std::string_view::npos &&
           description.find("above") == std::string_view::npos &&
           description.find("vacuum") == std::string_view::npos;
}

// The advice for a gauge reading beside absolute ones where the file declares no site
// barometer: its barometer at sea level, where it declares one, in the reading's unit.
std::string checker::barometer_advice(std::uint32_t reading, double unit) const {
    if (const std::optional<std::string> barometer = barometer_converted_to(unit);
        barometer && file_.nodes[syntax::inside_brackets(file_, reading)].kind == expr_kind::symbol)
        return fmt::format("convert first: a gauge reading plus the barometer is absolute: "
                           "write ({} + {})",
                           display_text(file_.nodes[reading].range), *barometer);
    return "convert first: a gauge reading plus the atmospheric pressure is absolute";
}

// "p_b*100": the barometer the file declares, in `unit`, where it is declared in another
// (bar beside kPa); empty where the file declares none.
std::optional<std::string> checker::barometer_converted_to(double unit) const {
    if (!std::isfinite(unit) || !(unit > 0.0))
        return std::nullopt;
    if (const auto name = barometer_in_unit(unit))
        return std::string(*name);
    for (const syntax::declaration& decl : file_.declarations) {
        if (!declares_a_barometer(decl) || !(decl.kind.si_factor > 0.0))
            continue;
        const std::string_view name = text(file_.names[decl.first_name].name);
        const double factor = decl.kind.si_factor / unit;
        return factor >= 1.0 ? fmt::format("{}*{}", name, format_factor(factor))
                             : fmt::format("{}/{}", name, format_factor(1.0 / factor));
    }
    return std::nullopt;
}

// Whether a symbol's unit or description says outright that it is absolute: psia, bara,
// "bar a", "kPa(a)", "abs", or "absolute" in its words.
bool checker::said_absolute(const symbol_entry& e) {
    const std::string_view unit = e.unit_text;
    return unit.find("psia") != std::string_view::npos ||
           unit.find("bara") != std::string_view::npos ||
           unit.find("abs") != std::string_view::npos || unit.ends_with(" a") ||
           unit.ends_with("(a)") || e.description.find("absolute") != std::string_view::npos;
}

// Whether a symbol's name or description calls it a gauge reading (p_g, "gauge pressure").
bool checker::named_gauge(std::uint32_t node) const {
    if (file_.nodes[node].kind != expr_kind::symbol)
        return false;
    const std::string_view name = text(file_.nodes[node].range);
    const symbol_entry* entry = symbols_.find(name);
    const std::string_view description = entry != nullptr ? entry->description : "";
    // "p_mg : psia "memory gauge, which records absolute"": a unit or a description that
    // says absolute outright wins over the instrument's name.
    if (entry != nullptr && said_absolute(*entry))
        return false;
    return name.ends_with("_g") || name.find("gauge") != std::string_view::npos ||
           name.find("_g_") != std::string_view::npos ||
           description.find("gauge") != std::string_view::npos;
}

// "p_1 = p_2 + 14.7" with both in psia, "T_2 = T_1 + 460" in °R: a scale's zero added to a
// reading that is already absolute, so the atmosphere or the 459.67 is counted twice.
bool checker::report_zero_added_twice(std::span<const operand> terms, double unit,
                                      const compact_dimension& dim) {
    for (const auto& t : terms) {
        if (!is_shift_candidate(t) || t.subtracted)
            continue;
        const shift sh = shift_of(t);
        const double si = std::abs(sh.si + sh.written * unit);
        for (const auto& row : offset_rows()) {
            const double zero = std::abs(row.unit->offset);
            if (!(row.dim == dim) || zero == 0.0 ||
                std::abs(si - zero) > si * sh.tolerance + 1e-9 * zero)
                continue;
            const operand* reading = nullptr;
            for (const auto& r : terms)
                if (!is_shift_candidate(r) && r.type.known && r.type.point)
                    reading = &r;
            // "p_g : psi "gauge pressure"": declared loosely in an absolute unit, but named
            // a gauge reading, which is what the atmosphere is added to.
            if (reading != nullptr && row.unit->scale == unit_scale::gauge &&
                named_gauge(reading->node))
                return false;
            const bool gauge = row.unit->scale == unit_scale::gauge;
            const std::string zero_of =
                gauge ? std::string("the atmosphere, the zero of gauge pressures")
                      : fmt::format("the zero of the {} scale", row.unit->symbol);
            diagnostic& d =
                report(rules::offset_scale,
                       fmt::format("{} is {}, added to {}, a reading already on an absolute scale: "
                                   "the sum counts that zero twice",
                                   display_text(file_.nodes[t.node].range), zero_of,
                                   reading != nullptr ? quote(reading->node) : "a reading"),
                       file_.nodes[t.node].range);
            add_number_term(d, t, reading != nullptr ? reading->type.dim : t.type.dim);
            if (reading != nullptr)
                add_term(d, *reading);
            d.notes.push_back(
                {gauge ? std::string("a gauge reading plus the atmosphere is absolute; a "
                                     "reading declared absolute needs nothing added (declare "
                                     "it in psig, barg or kPag if it is a gauge reading)")
                       : fmt::format("a {} reading plus {:g} is absolute; a reading declared "
                                     "absolute needs nothing added (declare it in {} if it "
                                     "is a {} reading)",
                                     row.unit->symbol, row.unit->offset / row.unit->factor,
                                     row.unit->symbol, row.unit->symbol),
                 {}});
            return true;
        }
        if (report_zero_in_another_unit_added(t, sh, unit, dim, terms))
            return true;
        // "p_x = p_psia + 14.14" where the file declares the site's barometer, 97.5 kPa:
        // the atmosphere at the site, added to a reading already absolute.
        const site_barometer* site = dim == pressure ? declared_site_barometer() : nullptr;
        if (site == nullptr || std::abs(si / site->pascals - 1.0) > site_barometer_slack)
            continue;
        // "p_hg + p_b >= p_sat + 1.0 {bar}": in a limit a typed quantity is a margin (a
        // holding tube kept a bar above saturation), however near the barometer it falls.
        if (file_.nodes[syntax::inside_brackets(file_, t.node)].kind == expr_kind::quantity &&
            current_is_limit())
            continue;
        const auto reading = std::find_if(terms.begin(), terms.end(), [&](const operand& r) {
            return !is_shift_candidate(r) && r.type.known && r.type.point &&
                   r.type.offset == nullptr && r.type.dim == pressure;
        });
        if (reading == terms.end() || named_gauge(reading->node))
            continue;
        diagnostic& d = report(rules::offset_scale,
                               fmt::format("{} is the site's barometer '{}', added to {}, a "
                                           "reading already on an absolute scale: the sum "
                                           "counts the atmosphere twice",
                                           display_text(file_.nodes[t.node].range), site->name,
                                           quote(reading->node)),
                               file_.nodes[t.node].range);
        add_number_term(d, t, reading->type.dim);
        add_term(d, *reading);
        d.notes.push_back({"a gauge reading plus the barometer is absolute; a reading declared "
                           "absolute needs nothing added (declare it in psig, barg or kPag if "
                           "it is a gauge reading)",
                           {}});
        return true;
    }
    return false;
}

// "p_k + 14.7" with p_k an absolute reading in kPa, "T_K + 459.67": a scale's zero as
// printed in another unit (the atmosphere in psi, the °F scale's zero in °R) is added to a
// reading already absolute. Read in the sum's own unit it would be a small shift (14.7
// kPa), but no engineer writes 14.7 or 459.67 for that.
bool checker::report_zero_in_another_unit_added(const operand& t, const shift& sh, double unit,
                                                const compact_dimension& dim,
                                                std::span<const operand> terms) {
    // Printed to three digits or more: "p + 0.1" is no atmosphere in MPa.
    if (sh.si != 0.0 || sh.written <= 0.0 || sh.tolerance > 0.005)
        return false;
    struct printed_zero {
        std::string_view unit;  // the unit it is printed in
        std::string_view scale; // whose zero it is
        double value;           // in that unit
        double factor;          // SI value of that unit
    };
    // The °C and °F zeros in K and °R (NIST SP 811 (2008), 4.2.1.1).
    std::array<printed_zero, 9> zeros{};
    std::size_t count = 0;
    for (const auto& u : pressure_units)
        zeros[count++] = {u.name, "", standard_atmosphere / u.pascals, u.pascals};
    zeros[count++] = {"K", "\u00B0C", 273.15, 1.0};
    zeros[count++] = {"\u00B0R", "\u00B0F", 459.67, 5.0 / 9.0};
    const bool pressure = dim == pressure_dimension();
    if (!pressure && !(dim == temperature_dimension()))
        return false;
    for (const printed_zero& z : std::span(zeros.data(), count)) {
        if (z.scale.empty() != pressure || std::abs(z.factor / unit - 1.0) < 1e-9 ||
            std::abs(sh.written - z.value) > sh.written * sh.tolerance + 1e-9 * z.value)
            continue;
        const operand* reading = nullptr;
        for (const auto& r : terms)
            if (!is_shift_candidate(r) && r.type.known && r.type.point)
                reading = &r;
        if (reading != nullptr && pressure && named_gauge(reading->node))
            return false;
        diagnostic& d =
            report(rules::offset_scale,
                   fmt::format("{} is {} in {}, added to {}, a reading already on an absolute "
                               "scale and in another unit: the sum counts that zero twice",
                               display_text(file_.nodes[t.node].range),
                               pressure ? std::string("the atmosphere")
                                        : fmt::format("the zero of the {} scale", z.scale),
                               z.unit, reading != nullptr ? quote(reading->node) : "a reading"),
                   file_.nodes[t.node].range);
        add_number_term(d, t, reading != nullptr ? reading->type.dim : t.type.dim);
        if (reading != nullptr)
            add_term(d, *reading);
        d.notes.push_back({"a reading declared absolute needs nothing added; where it is a "
                           "gauge or a \u00B0C or \u00B0F reading, declare it so, and add "
                           "the zero in its own unit",
                           {}});
        return true;
    }
    return false;
}

// Whether the node is one whole side of a formula of two or more sides (in parentheses or
// not): there alone "p_abs - p_g" can stand for the atmosphere, set equal to a reading of
// it. Inside a product or a sum it is a slip (a bar value less a barg one).
bool checker::is_whole_side(std::uint32_t node) const {
    if (current_ == nullptr || current_->side_count < 2)
        return false;
    for (std::uint32_t i = 0; i < current_->side_count; ++i) {
        std::uint32_t root = file_.sides[current_->first_side + i].root;
        root = syntax::inside_brackets(file_, root);
        if (root == node)
            return true;
    }
    return false;
}

// "p_abs - p_g": one absolute reading less one reading on an offset scale leaves that
// scale's zero (the atmosphere for a gauge): the offset unit, or null when the terms are
// anything else.
const unit_definition* checker::subtracted_scale_zero(std::span<const operand> terms,
                                                      double final_origin, double slack) const {
    const operand* added = nullptr;
    const operand* subtracted = nullptr;
    for (const auto& t : terms) {
        if (!t.type.known || !t.type.point)
            continue;
        const operand*& slot = t.subtracted ? subtracted : added;
        if (slot != nullptr)
            return nullptr;
        slot = &t;
    }
    if (added == nullptr || subtracted == nullptr || added->type.offset != nullptr ||
        added->type.origin != 0.0 || subtracted->type.offset == nullptr)
        return nullptr;
    if (std::abs(subtracted->type.origin + final_origin) > slack)
        return nullptr;
    return subtracted->type.offset;
}

// "T_C - T_K", "p_bar - p_barg": readings on two scales with different zeros.
void checker::report_mixed_scales(std::span<const operand> terms, double difference) {
    const operand* on_offset = nullptr;
    const operand* other = nullptr;
    for (const auto& t : terms) {
        if (!t.type.known || !t.type.point)
            continue;
        if (t.type.offset != nullptr && on_offset == nullptr)
            on_offset = &t;
        else if (other == nullptr)
            other = &t;
    }
    if (on_offset == nullptr)
        on_offset = &terms.front();
    const bool temperature = on_offset->type.dim == temperature_dimension();
    const unit_definition* named =
        scale_named(on_offset->type.origin, 0.0, on_offset->type.dim, terms);
    if (named == nullptr) {
        report_shifted_difference(terms, difference, temperature);
        return;
    }
    const unit_definition& unit = *named;
    // "C48 - (C49 - 32)/1.8": the other reading converted onto another offset scale, whose
    // zero is not the absolute one.
    const unit_definition* other_scale =
        other != nullptr && std::abs(other->type.origin) > 1e-9
            ? scale_named(other->type.origin, 0.0, other->type.dim, terms)
            : nullptr;
    diagnostic& d = report(
        rules::offset_scale,
        other_scale != nullptr && other_scale != &unit
            ? fmt::format("{} is on the {} scale and {} on the {} scale, so their difference "
                          "is off by the difference of the scales' zeros",
                          quote(on_offset->node), unit.symbol, quote(other->node),
                          other_scale->symbol)
        : other != nullptr
            ? fmt::format("{} is on the {} scale and {} on an absolute one, so their "
                          "difference is off by the {} scale's zero",
                          quote(on_offset->node), unit.symbol, quote(other->node), unit.symbol)
            : fmt::format("{} is on the {} scale, and the other terms do not cancel its zero",
                          quote(on_offset->node), unit.symbol),
        file_.nodes[on_offset->node].range);
    add_term(d, *on_offset);
    if (other != nullptr)
        add_term(d, *other);
    // "(p_sg - p_v)*1000/(ρ*g)" at a site whose barometer the file declares: the gauge
    // reading lacks that barometer, not the sea level's atmosphere.
    const site_barometer* site =
        !temperature && unit.scale == unit_scale::gauge ? declared_site_barometer() : nullptr;
    d.notes.push_back(
        {site != nullptr
             ? fmt::format("as written the result is off by the atmosphere the gauge reads "
                           "from: the site's barometer '{}' ({} kPa)",
                           site->name, format_factor(site->pascals / 1000.0))
             : fmt::format("as written the result is off by {} {}{}",
                           format_factor(std::abs(difference)), temperature ? "K" : "Pa",
                           temperature ? "" : ", the atmosphere the gauge reads from"),
         {}});
    // "p_atm = p_g - p_a": set equal to an absolute reading, the difference was meant as the
    // scale's zero, and is its negative.
    if (other != nullptr && !on_offset->subtracted && other->subtracted &&
        other->type.offset == nullptr && sum_side_hint_ != nullptr && sum_side_hint_->known &&
        sum_side_hint_->point && sum_side_hint_->offset == nullptr)
        d.notes.push_back(
            {fmt::format("{} less {} would be the {} scale's zero as an absolute reading; "
                         "this way round it is its negative",
                         quote(other->node), quote(on_offset->node), unit.symbol),
             {}});
    const auto [numbers_unit, numbers_unit_name] = unit_of_numbers(on_offset->type, unit);
    d.notes.push_back(
        {temperature && other_scale != nullptr && other_scale != &unit
             ? fmt::format("convert first: take both readings to one scale, {} or {}", unit.symbol,
                           other_scale->symbol)
         : temperature ? fmt::format("convert first: a {} reading plus {:g} is in {}", unit.symbol,
                                     unit.offset / unit.factor,
                                     std::abs(unit.factor - 1.0) < 1e-12 ? "K" : "degrees Rankine")
                       : site_atmosphere_advice(display_text(file_.nodes[on_offset->node].range),
                                                numbers_unit, numbers_unit_name)
                             .value_or(barometer_advice(on_offset->node, numbers_unit)),
         {}});
}

// "p_a - 14.7 - p_h" with every pressure absolute: the readings cancel to a difference,
// which has no zero for the number to move. Most often one of the pressures subtracted is
// a drop, not a reading, and only its name does not say so.
void checker::report_shifted_difference(std::span<const operand> terms, double difference,
                                        bool temperature) {
    const operand* number = nullptr;
    const operand* subtracted = nullptr;
    for (const auto& t : terms) {
        if (is_shift_candidate(t) && number == nullptr)
            number = &t;
        else if (t.subtracted && t.type.known && t.type.point && subtracted == nullptr)
            subtracted = &t;
    }
    const operand& at = number != nullptr ? *number : terms.front();
    diagnostic& d =
        report(rules::offset_scale,
               fmt::format("the readings in this sum cancel to a difference, which has no zero, "
                           "yet {} moves the zero by {} {}",
                           number != nullptr ? quote(number->node) : std::string("a number"),
                           format_factor(std::abs(difference)), temperature ? "K" : "Pa"),
               file_.nodes[at.node].range);
    add_term(d, at);
    if (subtracted != nullptr)
        d.notes.push_back(
            {fmt::format("{} is read as a reading on an absolute scale; if it is a drop or "
                         "a rise (a loss, a column of liquid), say so in its name (\u0394{}) "
                         "or its description (\"... drop\"), and the number is then the "
                         "scale's zero",
                         quote(subtracted->node), text(file_.nodes[subtracted->node].range)),
             {}});
}

// "p_bh - p_atm - 14.7": the atmosphere taken off as a symbol and again as a number.
bool checker::report_atmosphere_taken_twice(std::span<const operand> terms, std::size_t only) {
    double taken = 0.0;
    const operand* number = nullptr;
    const operand* atmosphere = nullptr;
    for (const auto& t : terms) {
        if (is_shift_candidate(t) && t.subtracted) {
            const shift s = shift_of(t);
            taken -= s.si + s.written * terms[only].type.scale;
            number = &t;
        } else if (t.subtracted && names_atmosphere(t.node)) {
            atmosphere = &t;
        }
    }
    if (number == nullptr || atmosphere == nullptr ||
        !(std::abs(taken / standard_atmosphere - 1.0) < 0.05))
        return false;
    diagnostic& d = report(rules::offset_scale,
                           fmt::format("{} and {} both take off the atmosphere: the result is "
                                       "one atmosphere below the gauge reading",
                                       quote(atmosphere->node), quote(number->node)),
                           file_.nodes[number->node].range);
    add_term(d, *atmosphere);
    add_number_term(d, *number, atmosphere->type.dim);
    d.notes.push_back({"an absolute pressure less the atmosphere is the gauge reading; take "
                       "it off once",
                       {}});
    return true;
}

// Whether a term is a symbol named or described as the atmosphere or a barometer.
bool checker::names_atmosphere(std::uint32_t node) const {
    node = syntax::inside_brackets(file_, node);
    if (file_.nodes[node].kind != expr_kind::symbol)
        return false;
    const std::string_view name = text(file_.nodes[node].range);
    const symbol_entry* e = symbols_.find(name);
    return names_the_atmosphere(name, e != nullptr ? e->description : std::string_view());
}

// "(p_abs + p_b - p_vap)" in an NPSH: a pressure the file calls absolute (psia, bar a, or
// "absolute" in its description) with the barometer added again counts the atmosphere twice,
// some 100 kPa over (common practice: NPSH_a from an absolute suction pressure takes no
// barometer, from a gauge one it does).
void checker::report_barometer_added_to_absolute(std::span<const operand> terms) {
    // Most pressure sums hold no reading called absolute: that is looked for first, and the
    // barometer's words only beside one.
    const operand* absolute = nullptr;
    for (const operand& t : terms) {
        const syntax::expr_node& n = file_.nodes[t.node];
        if (t.subtracted || n.kind != expr_kind::symbol)
            continue;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e != nullptr && e->offset_unit == nullptr && said_absolute(*e) &&
            !names_the_atmosphere(text(n.range), e->description))
            absolute = &t;
    }
    if (absolute == nullptr)
        return;
    const operand* barometer = nullptr;
    for (const operand& t : terms) {
        const syntax::expr_node& n = file_.nodes[t.node];
        if (&t == absolute || t.subtracted || n.kind != expr_kind::symbol)
            continue;
        const symbol_entry* e = symbols_.find(text(n.range));
        if (e != nullptr && e->offset_unit == nullptr &&
            names_the_atmosphere(text(n.range), e->description))
            barometer = &t;
    }
    if (barometer == nullptr)
        return;
    diagnostic& d =
        report(rules::offset_scale,
               fmt::format("{} is already an absolute pressure, and {} adds the atmosphere to it "
                           "again: the sum counts the atmosphere twice",
                           quote(absolute->node), quote(barometer->node)),
               file_.nodes[barometer->node].range);
    d.level = severity::warning;
    add_term(d, *absolute);
    add_term(d, *barometer, true);
    d.notes.push_back({"add the barometer to a gauge reading only; an absolute reading "
                       "already holds it",
                       {}});
}

// "Δp_CO2 = x_CO2/100*p_2g - y_CO2/100*p_pa": shares of two pressures, one a gauge reading and
// one absolute, are partial pressures (Dalton's law), which count from vacuum: the gauge's
// share leaves out the atmosphere's. Reported where each term is a share (a dimensionless
// symbol, a percentage) of one pressure reading; a gauge reading scaled alone, less a drop, is
// left to the sum's rules.
bool checker::report_share_of_gauge_beside_absolute(std::span<const operand> terms) {
    const operand* gauge_share = nullptr;
    const operand* absolute_share = nullptr;
    const symbol_entry* gauge = nullptr;
    for (const operand& t : terms) {
        const std::uint32_t node = syntax::inside_brackets(file_, t.node);
        const expr_kind kind = file_.nodes[node].kind;
        if (kind != expr_kind::multiply && kind != expr_kind::divide)
            continue;
        bool share = false;
        const symbol_entry* reading = nullptr;
        const bool other = for_each_factor(node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return false;
            const symbol_entry* e =
                n.kind == expr_kind::symbol ? symbols_.find(text(n.range)) : nullptr;
            if (e == nullptr || !e->compact_dim)
                return true;
            if (sign > 0 && e->compact_dim->is_dimensionless() && e->offset_unit == nullptr) {
                share = true;
                return false;
            }
            if (sign > 0 && reading == nullptr && *e->compact_dim == pressure_dimension() &&
                (e->offset_unit != nullptr || e->reading == 1)) {
                reading = e;
                return false;
            }
            return true;
        });
        if (other || !share || reading == nullptr)
            continue;
        if (reading->offset_unit != nullptr) {
            gauge_share = &t;
            gauge = reading;
        } else {
            absolute_share = &t;
        }
    }
    if (gauge_share == nullptr || absolute_share == nullptr)
        return false;
    diagnostic& d = report(
        rules::offset_scale,
        fmt::format("{} is a share of a reading on the {} scale beside {}, a share of an absolute "
                    "pressure: partial pressures count from vacuum, and the gauge's share leaves "
                    "the atmosphere's out",
                    quote(gauge_share->node), gauge->offset_unit->symbol,
                    quote(absolute_share->node)),
        file_.nodes[gauge_share->node].range);
    add_term(d, *gauge_share, true);
    add_term(d, *absolute_share);
    d.notes.push_back(
        {"a partial pressure is a share of the absolute pressure (Dalton's law): take the share "
         "of the gauge reading plus the site's barometer",
         {}});
    return true;
}

// "h_pz = p_pz*1000/(ρ_w*g)" with p_pz absolute (a non-vented piezometer): over ρ·g an
// absolute pressure is the column that would stand above a vacuum, some 10 m of water more
// than the head above the point, which takes the pressure above the atmosphere (common
// practice). Only a head set equal to one absolute reading over the rest or times them
// (2.31*p_psia in ft of water), no other pressure, alone or as one term of the energy's sum
// ("p_a/(ρ*g) + V^2/(2*g)", a turbine's net head);
// "(p_pz - p_b)*1000/(ρ*g)" and NPSH's (p_abs - p_v)/(ρ*g) take a difference first.
void checker::report_head_from_absolute(std::span<const operand> sides) {
    if (!declares_gauge_or_absolute_pressure())
        return;
    // The one absolute reading among a quotient's factors, walked with a small stack of its
    // own: the rule is asked of many a length, and almost every one has no absolute reading.
    // `other`: a pressure that is no lone absolute reading over the rest.
    const auto absolute_reading = [&](std::uint32_t column, bool& other) {
        std::array<std::pair<std::uint32_t, int>, 16> pending{};
        std::size_t count = 0;
        pending[count++] = {column, 1};
        std::uint32_t reading = syntax::no_index;
        while (count > 0 && !other) {
            const auto [at, sign] = pending[--count];
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::multiply || n.kind == expr_kind::divide) {
                if (count + 2 > pending.size()) {
                    other = true;
                    break;
                }
                pending[count++] = {n.lhs, sign};
                pending[count++] = {n.rhs, n.kind == expr_kind::divide ? -sign : sign};
                continue;
            }
            if (n.kind == expr_kind::group) {
                pending[count++] = {n.lhs, sign};
                continue;
            }
            if (n.kind != expr_kind::symbol)
                continue;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || !(*e->compact_dim == pressure_dimension()))
                continue;
            if (sign < 0 || reading != syntax::no_index || e->offset_unit != nullptr ||
                !said_absolute(*e) || names_the_atmosphere(text(n.range), e->description))
                other = true;
            else
                reading = at;
        }
        return reading;
    };
    for (std::size_t k = 0; k < 2; ++k) {
        const std::uint32_t head = syntax::inside_brackets(file_, sides[k].node);
        std::uint32_t column = syntax::inside_brackets(file_, sides[1 - k].node);
        if (file_.nodes[head].kind != expr_kind::symbol)
            continue;
        bool other = false;
        std::uint32_t reading = syntax::no_index;
        if (file_.nodes[column].kind == expr_kind::divide ||
            file_.nodes[column].kind == expr_kind::multiply) {
            reading = absolute_reading(column, other);
        } else if (file_.nodes[column].kind == expr_kind::add) {
            // The energy's terms: the one that holds the reading is added, a quotient, and
            // no other term holds a pressure.
            std::uint32_t found = syntax::no_index;
            std::uint32_t at = column;
            while (!other) {
                const syntax::expr_node& n = file_.nodes[at];
                const bool more = n.kind == expr_kind::add || n.kind == expr_kind::subtract;
                const std::uint32_t term = more ? n.rhs : at;
                const std::uint32_t r = absolute_reading(term, other);
                if (r != syntax::no_index) {
                    const expr_kind kind = file_.nodes[syntax::inside_brackets(file_, term)].kind;
                    if (found != syntax::no_index || (more && n.kind == expr_kind::subtract) ||
                        (kind != expr_kind::divide && kind != expr_kind::multiply))
                        other = true;
                    found = term;
                    reading = r;
                }
                if (!more)
                    break;
                at = n.lhs;
            }
            column = found;
        }
        if (other || reading == syntax::no_index)
            continue;
        const std::string_view head_name = text(file_.nodes[head].range);
        const symbol_entry* h = symbols_.find(head_name);
        if (h == nullptr || names_the_atmosphere(head_name, h->description) || said_absolute(*h))
            continue;
        const symbol_entry& e = *symbols_.find(text(file_.nodes[reading].range));
        const std::optional<std::string_view> barometer = barometer_in_unit(e.si_factor);
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} is an absolute pressure: as a column it counts from a vacuum, about "
                        "10 m of water more than the head {} above the atmosphere",
                        quote(reading), quote(head)),
            file_.nodes[column].range);
        d.level = severity::warning;
        d.notes.push_back(
            {fmt::format("a head takes the pressure above the atmosphere: write ({} - {})",
                         display_text(file_.nodes[reading].range),
                         barometer ? std::string(*barometer)
                                   : fmt::format("the atmospheric pressure in {}", e.unit_text)),
             {}});
        return;
    }
}

// "p_abs = (q/K)^2", "p_bot = ρ*g*h" with p_abs called absolute (psia, bar a, or "absolute" in
// its words): a drop across an orifice or a column of liquid is the pressure above what lies
// at its far end, the atmosphere for a sprinkler head or an open tank, so alone it gives a
// gauge reading (common practice). Not a barometer's column (p_b = ρ_Hg*g*h), whose top is
// a vacuum; a warning, since a column under a sealed vacuum reads absolute too.
void checker::report_absolute_set_to_difference(std::span<const operand> sides) {
    for (std::size_t k = 0; k < 2; ++k) {
        const operand& absolute = sides[k];
        const operand& difference = sides[1 - k];
        if (!difference.type.absolute_pressure_difference || !absolute.type.known ||
            absolute.type.offset != nullptr || !(absolute.type.dim == pressure_dimension()))
            continue;
        const std::uint32_t at = syntax::inside_brackets(file_, absolute.node);
        if (file_.nodes[at].kind != expr_kind::symbol)
            continue;
        const std::string_view name = text(file_.nodes[at].range);
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr || e->offset_unit != nullptr || !said_absolute(*e) ||
            names_the_atmosphere(name, e->description))
            continue;
        // Nothing on the other side may be absolute already: "p_abs = p_top*ρ*g*h/p_ref"
        // scales an absolute reading.
        const bool holds_absolute = syntax::search_subtree(
            file_, difference.node, [&](std::uint32_t, const syntax::expr_node& n) {
                if (n.kind != expr_kind::symbol)
                    return search_step::descend;
                const std::string_view s = text(n.range);
                const symbol_entry* o = symbols_.find(s);
                return o != nullptr &&
                               (said_absolute(*o) || names_the_atmosphere(s, o->description))
                           ? search_step::found
                           : search_step::descend;
            });
        if (holds_absolute)
            continue;
        diagnostic& d =
            report(rules::offset_scale,
                   fmt::format("{} is an absolute pressure, but {} is a pressure difference alone: "
                               "it counts from the pressure at its far end, the atmosphere for a "
                               "column or an orifice open to it",
                               quote(absolute.node), quote(difference.node)),
                   file_.nodes[difference.node].range);
        d.level = severity::warning;
        add_term(d, absolute);
        add_term(d, difference, true);
        d.notes.push_back({"add the site's barometer (or the pressure at the column's top) to "
                           "give an absolute pressure, or declare the side a gauge reading",
                           {}});
        return;
    }
}

// "u = 6.895*p_A" with u a pore water pressure, counted from the atmosphere as a vented
// piezometer reads it, and p_A an unvented transducer's absolute reading; "u = 6.895*p_V + p_b",
// a vented one with the barometer added: a pressure the file counts from the atmosphere (a
// difference by its name or words) set equal to an absolute reading comes out an atmosphere
// high (common practice). Only a lone reading said absolute, or a gauge reading plus a
// barometer, times numbers that convert it.
void checker::report_difference_set_to_absolute(std::span<const operand> sides) {
    if (!declares_gauge_or_absolute_pressure())
        return;
    for (std::size_t k = 0; k < 2; ++k) {
        const operand& difference = sides[k];
        const operand& other = sides[1 - k];
        const std::uint32_t named = syntax::inside_brackets(file_, difference.node);
        if (file_.nodes[named].kind != expr_kind::symbol || difference.type.point ||
            difference.type.numeric || difference.type.offset != nullptr ||
            !difference.type.known || !(difference.type.dim == pressure_dimension()))
            continue;
        const symbol_entry* d_entry = symbols_.find(text(file_.nodes[named].range));
        if (d_entry == nullptr || said_absolute(*d_entry))
            continue;
        const std::uint32_t side = syntax::inside_brackets(file_, other.node);
        const std::uint32_t reading = sole_symbol_times_numbers(side);
        if (reading != syntax::no_index) {
            const std::string_view name = text(file_.nodes[reading].range);
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || e->offset_unit != nullptr || !said_absolute(*e) ||
                names_the_atmosphere(name, e->description))
                continue;
            const std::optional<std::string_view> barometer =
                barometer_in_unit(difference.type.scale);
            diagnostic& d =
                report(rules::offset_scale,
                       fmt::format("{} is an absolute pressure, but {} counts from the atmosphere: "
                                   "set equal to it, the result is one atmosphere high",
                                   quote(other.node), quote(difference.node)),
                       file_.nodes[other.node].range);
            d.level = severity::warning;
            add_term(d, other);
            add_term(d, difference, true);
            d.notes.push_back({fmt::format("take the barometer off: write ({} - {})",
                                           display_text(file_.nodes[other.node].range),
                                           barometer ? std::string(*barometer)
                                                     : std::string("the atmospheric pressure")),
                               {}});
            return;
        }
        const syntax::expr_node& sum = file_.nodes[side];
        if (sum.kind != expr_kind::add)
            continue;
        for (const auto& [gauge_term, barometer_term] :
             {std::pair{sum.lhs, sum.rhs}, std::pair{sum.rhs, sum.lhs}}) {
            const std::uint32_t gauge = sole_symbol_times_numbers(gauge_term);
            const std::uint32_t barometer = syntax::inside_brackets(file_, barometer_term);
            if (gauge == syntax::no_index || file_.nodes[barometer].kind != expr_kind::symbol ||
                !names_atmosphere(barometer))
                continue;
            const symbol_entry* g = symbols_.find(text(file_.nodes[gauge].range));
            if (g == nullptr || g->offset_unit == nullptr ||
                g->offset_unit->scale != unit_scale::gauge)
                continue;
            diagnostic& d =
                report(rules::offset_scale,
                       fmt::format("{} adds the barometer {} to a gauge reading, which makes it "
                                   "absolute, but {} counts from the atmosphere, as the gauge "
                                   "reading does: the result is one atmosphere high",
                                   quote(other.node), quote(barometer), quote(difference.node)),
                       file_.nodes[barometer].range);
            d.level = severity::warning;
            add_term(d, difference, true);
            // A vacuum counts down from the atmosphere: the gauge's reading below it, negated.
            d.notes.push_back(
                {names_a_vacuum(named)
                     ? fmt::format("a vacuum is how far below the barometer the pressure is: "
                                   "write -({}), the gauge reading negated",
                                   display_text(file_.nodes[gauge_term].range))
                     : fmt::format("drop the {}: the gauge reading, converted, is already the "
                                   "pressure above the atmosphere",
                                   display_text(file_.nodes[barometer].range)),
                 {}});
            return;
        }
    }
}

// "p_c = 3.386*p_vac" with p_c the condenser's absolute pressure and p_vac its vacuum in
// inHg: a vacuum gauge reads how far below the barometer the pressure is, so the absolute
// pressure is the barometer less the vacuum (ASME PTC 12.2 reads a condenser so, from
// memory). And "p_st_a = p_skid/14.5" with p_skid in psi "on the skid's pressure gauge": a
// gauge reads above the barometer, whatever its dial's unit is called. Both sides are
// pressures in plain units, and only the words tell them apart.
void checker::report_barometer_reading_as_absolute(std::span<const operand> sides) {
    for (std::size_t k = 0; k < 2; ++k) {
        const std::uint32_t absolute = sole_symbol_times_numbers(sides[k].node);
        const std::uint32_t reading = sole_symbol_times_numbers(sides[1 - k].node);
        if (absolute == syntax::no_index || reading == syntax::no_index)
            continue;
        const std::string_view absolute_name = text(file_.nodes[absolute].range);
        const std::string_view reading_name = text(file_.nodes[reading].range);
        const symbol_entry* a = symbols_.find(absolute_name);
        const symbol_entry* r = symbols_.find(reading_name);
        // The cheap test first: every pressure equation comes here, few with a reading whose
        // words say a gauge or a vacuum reads it.
        if (r == nullptr || (r->description.find("auge") == std::string_view::npos &&
                             !counts_below_the_barometer(reading_name, r->description)))
            continue;
        if (a == nullptr || !a->compact_dim || !r->compact_dim ||
            *a->compact_dim != pressure_dimension() || *r->compact_dim != pressure_dimension() ||
            a->offset_unit != nullptr || r->offset_unit != nullptr || !said_absolute(*a) ||
            counts_below_the_barometer(absolute_name, a->description) ||
            names_a_difference(absolute_name, a->description) ||
            names_a_difference(reading_name, r->description) || said_absolute(*r))
            continue;
        const bool vacuum = counts_below_the_barometer(reading_name, r->description);
        if (!vacuum && !describes_a_gauge_reading(r->description))
            continue;
        diagnostic& d = report(
            rules::offset_scale,
            vacuum ? fmt::format("{} is an absolute pressure, but {} is a vacuum, counted down "
                                 "from the barometer: the absolute pressure is the barometer "
                                 "less the vacuum",
                                 quote(absolute), quote(reading))
                   : fmt::format("{} is an absolute pressure, but {} is read on a gauge, by its "
                                 "words, counted up from the barometer: the absolute pressure is "
                                 "the gauge reading plus the barometer",
                                 quote(absolute), quote(reading)),
            file_.nodes[sides[1 - k].node].range);
        d.level = severity::warning;
        add_term(d, sides[k]);
        add_term(d, sides[1 - k], true);
        const std::string written = display_text(file_.nodes[sides[1 - k].node].range);
        const std::optional<std::string> barometer = barometer_converted_to(sides[k].type.scale);
        const std::string site = barometer ? *barometer : std::string("barometer");
        std::string advice = vacuum ? fmt::format("write ({} - {})", site, written)
                                    : fmt::format("write ({} + {})", written, site);
        if (!barometer)
            advice += fmt::format(", the barometer in the unit of {}", quote(absolute));
        d.notes.push_back({std::move(advice), {}});
        return;
    }
}

// "ρ_a = 101.325 {kPa}*M_a/({R}*T_a)": the air's density at the site from the gas law takes the
// pressure there, the site's barometer where the file declares one, not the standard
// atmosphere typed as a quantity. Only where the atmosphere multiplies and is the product's one
// pressure: over another pressure ("p/101.325 {kPa}") it is a reference state's, as a normal
// volume's correction takes it.
void checker::report_sea_level_atmosphere_in_products(const syntax::formula& f) {
    const site_barometer* site = declared_site_barometer();
    // "p_b = 101.325 {kPa}*(1 - 2.25577e-5 {1/m}*z)^5.2559": the standard atmosphere's own
    // barometric formula gives the site's barometer from the sea level's.
    const bool names_the_barometer =
        syntax::search_formula(file_, f, [&](std::uint32_t, const syntax::expr_node& n) {
            return n.kind == expr_kind::symbol && text(n.range) == site->name
                       ? search_step::found
                       : search_step::descend;
        });
    if (names_the_barometer)
        return;
    // "ρ_S = M*101325 {Pa}/(R*288.15 {K})": the atmosphere beside a standard reference
    // temperature, 0 °C, 15 °C, 60 °F, 20 °C or 25 °C, is a reference state's density or
    // volume (ISO 13443), defined at sea level's pressure wherever the gas is.
    const auto standard_temperature = [&](std::uint32_t, const syntax::expr_node& n) {
        if (n.kind != expr_kind::quantity)
            return search_step::descend;
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        if (!q.dim || compact_dimension::fitted(*q.dim) != std::optional(temperature_dimension()))
            return search_step::skip;
        const double kelvins = quantity_si_value(n);
        for (const double reference : {273.15, 288.15, 288.706, 293.15, 298.15})
            if (std::abs(kelvins - reference) < 0.05)
                return search_step::found;
        return search_step::skip;
    };
    if (syntax::search_formula(file_, f, standard_temperature))
        return;
    bool reported = false;
    syntax::search_formula(file_, f, [&](std::uint32_t at, const syntax::expr_node& n) {
        if (reported)
            return search_step::found;
        if (n.kind != expr_kind::multiply && n.kind != expr_kind::divide)
            return search_step::descend;
        std::uint32_t atmosphere = syntax::no_index;
        int pressures = 0;
        for_each_factor(at, [&](std::uint32_t k, int sign) {
            const syntax::expr_node& factor = file_.nodes[k];
            std::optional<compact_dimension> dim;
            if (factor.kind == expr_kind::quantity) {
                const syntax::quantity_literal& q = file_.quantities[factor.lhs];
                if (q.dim)
                    dim = compact_dimension::fitted(*q.dim);
                if (dim && *dim == pressure_dimension() && !q.constant && sign > 0 &&
                    std::abs(quantity_si_value(factor) / standard_atmosphere - 1.0) < 2e-3)
                    atmosphere = k;
            } else if (factor.kind == expr_kind::power &&
                       file_.nodes[factor.rhs].kind == expr_kind::number &&
                       !written_whole(text(file_.nodes[factor.rhs].range))) {
                ++pressures; // a ratio raised to a fitted power: the atmosphere's own law
            } else if (factor.kind == expr_kind::symbol) {
                if (const symbol_entry* e = symbols_.find(text(factor.range));
                    e != nullptr && e->compact_dim)
                    dim = *e->compact_dim;
            }
            if (dim && *dim == pressure_dimension())
                ++pressures;
            return false;
        });
        if (atmosphere == syntax::no_index || pressures != 1)
            return search_step::descend;
        const double off = standard_atmosphere / site->pascals - 1.0;
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} is the atmosphere at sea level, but this file declares the site's "
                        "barometer '{}' ({} kPa): the product it stands in comes out {} % high",
                        display_text(file_.nodes[atmosphere].range), site->name,
                        format_factor(rounded_to_digits(site->pascals / 1000.0, 4)),
                        format_factor(rounded_to_digits(off * 100.0, 2))),
            file_.nodes[atmosphere].range);
        d.level = severity::warning;
        d.notes.push_back({fmt::format("the gas's state where it is is the site's: write '{}' in "
                                       "place of {}",
                                       site->name, display_text(file_.nodes[atmosphere].range)),
                           {}});
        reported = true;
        return search_step::found;
    });
}

} // namespace plumb::formula_check
