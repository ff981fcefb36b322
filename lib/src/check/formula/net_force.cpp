// A force from an absolute pressure: the atmosphere pushes on the face's other side too, so a
// jack's load, a roof's uplift, a fender's reaction or a tyre's contact area takes the gauge
// pressure, the net one (p·A with p above the atmosphere; common practice, and any statics
// text's free body of a plate with the atmosphere on both faces).
#include "check/formula/checker.hpp"
#include "model/difference_name.hpp"
#include "plumb/rules.hpp"

#include <fmt/format.h>

namespace plumb::formula_check {

// "(p_jack + 14.7 {psi})": a gauge reading with the atmosphere added, as a number, a typed
// quantity or a barometer; or a symbol its file calls absolute that is not the atmosphere.
// The gauge reading's node where there is one, the factor's own otherwise; no_index if the
// factor is neither.
std::uint32_t checker::absolute_pressure_in_factor(std::uint32_t at) const {
    const std::uint32_t inner = syntax::inside_brackets(file_, at);
    const syntax::expr_node& n = file_.nodes[inner];
    if (n.kind == expr_kind::symbol) {
        const std::string_view name = text(n.range);
        const symbol_entry* e = symbols_.find(name);
        return e != nullptr && e->compact_dim && *e->compact_dim == pressure_dimension() &&
                       e->offset_unit == nullptr && said_absolute(*e) &&
                       !names_the_atmosphere(name, e->description)
                   ? inner
                   : syntax::no_index;
    }
    if (n.kind != expr_kind::add)
        return syntax::no_index;
    std::uint32_t gauge = syntax::no_index;
    bool atmosphere = false;
    for (const std::uint32_t term : {n.lhs, n.rhs}) {
        const syntax::expr_node& t = file_.nodes[syntax::inside_brackets(file_, term)];
        if (t.kind == expr_kind::number || t.kind == expr_kind::quantity) {
            atmosphere = true;
        } else if (t.kind == expr_kind::symbol) {
            const std::string_view name = text(t.range);
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || !e->compact_dim || *e->compact_dim != pressure_dimension())
                return syntax::no_index;
            if (e->offset_unit != nullptr && e->offset_unit->scale == unit_scale::gauge)
                gauge = syntax::inside_brackets(file_, term);
            else if (names_the_atmosphere(name, e->description))
                atmosphere = true;
            else
                return syntax::no_index;
        } else {
            return syntax::no_index;
        }
    }
    return gauge != syntax::no_index && atmosphere ? gauge : syntax::no_index;
}

// Whether the file has declared, so far, a gauge pressure or one it calls absolute: without
// one no product can hold an absolute pressure this rule would name. Each declaration is
// looked at once, as the file is read.
bool checker::declares_gauge_or_absolute_pressure() {
    for (; pressure_declarations_seen_ < file_.declarations.size(); ++pressure_declarations_seen_) {
        const syntax::declaration& decl = file_.declarations[pressure_declarations_seen_];
        if (decl.name_count == 0)
            continue;
        const symbol_entry* e = symbols_.find(text(file_.names[decl.first_name].name));
        if (e != nullptr && e->compact_dim && *e->compact_dim == pressure_dimension() &&
            ((e->offset_unit != nullptr && e->offset_unit->scale == unit_scale::gauge) ||
             said_absolute(*e)))
            gauge_or_absolute_declared_ = true;
    }
    return gauge_or_absolute_declared_;
}

// "R_p = p_2a*A_c" in kN with p_2a absolute, "A = P/(p_tg + 14.7)": asked of an equation whose
// sides agree, one of them a force or an area and the other a product with one pressure in it.
void checker::report_force_from_absolute_pressure(std::span<const operand> sides) {
    if (!declares_gauge_or_absolute_pressure())
        return;
    for (std::size_t i = 0; i < sides.size(); ++i) {
        const operand& result = sides[i];
        const operand& product = sides[1 - i];
        if (!result.type.known || !product.type.known)
            continue;
        const bool force = result.type.dim == force_dim;
        if (!force && !(result.type.dim == area_dim))
            continue;
        // Where the pressure stands: over the area for a force, under the force for an area.
        const int wanted = force ? 1 : -1;
        std::uint32_t pressure = syntax::no_index;
        std::uint32_t reading = syntax::no_index;
        int pressures = 0;
        const bool other = for_each_factor(product.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::add || n.kind == expr_kind::subtract) {
                const std::uint32_t found = absolute_pressure_in_factor(at);
                if (found == syntax::no_index || sign != wanted)
                    return true;
                pressure = at;
                reading = found;
                ++pressures;
                return false;
            }
            if (n.kind != expr_kind::symbol)
                return n.kind != expr_kind::number && n.kind != expr_kind::quantity;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim)
                return true;
            if (*e->compact_dim == pressure_dimension()) {
                ++pressures;
                if (sign == wanted && absolute_pressure_in_factor(at) != syntax::no_index) {
                    pressure = at;
                    reading = at;
                }
            }
            return false;
        });
        if (other || pressures != 1 || pressure == syntax::no_index)
            continue;
        const bool sum = reading != pressure;
        const std::string what =
            sum ? fmt::format("{}, a gauge reading with the atmosphere added", quote(pressure))
                : quote(pressure);
        diagnostic& d = report(
            rules::offset_scale,
            force ? fmt::format("{} is a force from {}, an absolute pressure: the atmosphere "
                                "pushes on the face's other side as well, so the net force is "
                                "the gauge pressure times the area",
                                quote(result.node), what)
                  : fmt::format("{} is an area from a load over {}, an absolute pressure: the "
                                "atmosphere pushes on the face's other side as well, so the "
                                "load is carried by the gauge pressure",
                                quote(result.node), what),
            file_.nodes[pressure].range);
        d.level = severity::warning;
        d.notes.push_back(
            {sum ? fmt::format("write the gauge reading {} alone",
                               display_text(file_.nodes[reading].range))
                 : fmt::format("write ({} - the atmospheric pressure), unless the face's other "
                               "side holds a vacuum",
                               display_text(file_.nodes[reading].range)),
             {}});
        return;
    }
}

} // namespace plumb::formula_check
