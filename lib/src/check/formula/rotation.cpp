// Rotation: a speed in revolutions set against radians or a rim speed without its 2π or π.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

// The rotation rules' finding: a warning on the whole formula, with the fix beside it.
void checker::warn_of_missing_pi(const syntax::formula& f, std::string message, std::string fix) {
    diagnostic& d = report(rules::unit_scale, std::move(message),
                           file_.nodes[file_.sides[f.first_side].root].range);
    d.level = severity::warning;
    d.notes.push_back({std::move(fix), {}});
}

bool checker::is_rotating_power_or_torque(const compact_dimension& dim) {
    return dim == energy_dim || dim == power_dim;
}

// The sides the rotation rules ask about: a rotating power or torque, a speed, a frequency,
// and what a frequency in Hz meets in a capacitor or reactor (capacitance, inductance, a
// reactance in Ω), or a hydraulic motor's pressure from its torque.
bool checker::asks_for_two_pi(const compact_dimension& dim) {
    return is_rotating_power_or_torque(dim) || dim == frequency_dim || dim == velocity_dim ||
           dim == capacitance_dim || dim == inductance_dim || dim == resistance_dim ||
           dim == pressure_dimension();
}

// "M = 60000*P/n" with M in kN·m, P in kW and n in rpm: revolutions count as cycles, so
// the units agree without the 2π radians of a revolution that P = 2π·n·M needs (ω = 2π·n),
// and the torque comes out 2π times too large. Asked only of an equation that relates one
// torque, one power and one speed in revolutions, with no π or 2π written in it.
// The same holds where a speed in revolutions meets one in radians ("ω = n/60" with ω in
// rad/s) or a moment of inertia in a kinetic energy ("E = 0.5*I*(n/60)^2"), and a speed
// along a rim meets one in revolutions and a diameter (v = π·D·n).
void checker::report_revolution_without_two_pi(const syntax::formula& f,
                                               const compact_dimension& sides_dim) {
    rotation_census c;
    const auto classify = [&](rotating_part part, const compact_dimension& dim,
                              round_length round) {
        const bool reactive = part.unit.find("var") != std::string_view::npos ||
                              part.unit.find("VAr") != std::string_view::npos ||
                              part.unit.find("VAR") != std::string_view::npos;
        if (dim == volume_dim && (unit_marks_of(part.unit) & counts_revolutions) != 0) {
            ++c.displacements;
        } else if (dim == pressure_dimension()) {
            ++c.pressures;
        } else if (dim == capacitance_dim || dim == inductance_dim) {
            ++c.capacitors;
        } else if (dim == power_dim && reactive) {
            ++c.reactives;
        } else if ((unit_marks_of(part.unit) & counts_revolutions) != 0) {
            c.speed = part;
            ++c.speeds;
        } else if (dim == frequency_dim && part.unit.find("rad") != std::string_view::npos) {
            c.partner = part;
            ++c.angular_speeds;
        } else if (dim == moment_of_inertia_dim) {
            if (c.angular_speeds == 0)
                c.partner = part;
            ++c.inertias;
        } else if (dim == energy_dim) {
            bool energy_unit_named = part.unit.empty();
            for (const std::string_view energy_unit :
                 {"J", "Wh", "Btu", "BTU", "cal", "erg", "eV", "therm"})
                energy_unit_named =
                    energy_unit_named || part.unit.find(energy_unit) != std::string_view::npos;
            if (energy_unit_named) {
                ++c.energies;
            } else {
                c.torque = part;
                ++c.torques;
            }
        } else if (dim == power_dim) {
            ++c.powers;
        } else if (dim == velocity_dim) {
            c.rim = part;
            ++c.rim_speeds;
        } else if (dim == length_dim) {
            c.length = part;
            c.length_round = round;
            ++c.lengths;
        }
    };
    // Found: a 2π written in the formula, or a term this rule cannot read.
    const std::uint32_t first_root = file_.sides[f.first_side].root;
    const bool not_for_this_rule =
        syntax::search_formula(file_, f, [&](std::uint32_t at, const syntax::expr_node& n) {
            switch (n.kind) {
            case expr_kind::pi:
                ++c.pis;
                return search_step::skip;
            case expr_kind::number: {
                // 2π, π or their inverses written as numbers (6.283, 3.1416, 0.159), and with a
                // minute folded in (2π/60 = 0.1047 rad/s per rpm, 60/2π = 9.549).
                const double v = written_number(n.range);
                for (const double c :
                     {2.0 * std::numbers::pi, std::numbers::pi, 0.5 / std::numbers::pi,
                      1.0 / std::numbers::pi, std::numbers::pi / 30.0, 30.0 / std::numbers::pi})
                    if (std::abs(v / c - 1.0) < 0.003)
                        return search_step::found;
                // Unit conversions of length and time (10^k, 12 in/ft, 60 s/min, and
                // their products: 720, 60000) are no pitch count or stroke factor.
                bool conversion = false;
                for (const double clock : {1.0, 60.0, 1.0 / 60.0})
                    for (const double inches : {1.0, 12.0, 1.0 / 12.0}) {
                        const double rest = v / (clock * inches);
                        conversion = conversion || near_power_of_ten(rest, 1e-12) ||
                                     std::abs(rest - 1.0) < 1e-12;
                    }
                if (!conversion)
                    ++c.other_numbers;
                // 2 is 10 × (12 in per ft)/(60 s per min) above: the half-of-2π rule counts
                // only powers of ten and a minute as conversions.
                bool clock_conversion = false;
                for (const double clock : {1.0, 60.0, 1.0 / 60.0})
                    clock_conversion = clock_conversion || near_power_of_ten(v / clock, 1e-12) ||
                                       std::abs(v / clock - 1.0) < 1e-12;
                if (!clock_conversion)
                    ++c.numbers_not_clock_conversions;
                return search_step::skip;
            }
            case expr_kind::symbol: {
                const std::string_view name = text(n.range);
                const symbol_entry* e = symbols_.find(name);
                if (e == nullptr || !e->compact_dim)
                    return search_step::found;
                classify({name, e->unit_text}, *e->compact_dim,
                         names_a_diameter_or_radius(name, e->description));
                return search_step::skip;
            }
            case expr_kind::reference: {
                // A workbook's cell: its unit as written, and a length's row label.
                const syntax::reference_value& r = file_.references[n.lhs];
                const std::optional<compact_dimension> dim =
                    r.dim ? compact_dimension::fitted(*r.dim) : std::nullopt;
                if (!dim)
                    return search_step::found;
                // The cell written to stands first, named by its unit in the tree.
                const bool written =
                    file_.functions == syntax::function_names::spreadsheet && at == first_root;
                classify({written ? std::string_view() : text(n.range), r.unit_text}, *dim,
                         r.round);
                return search_step::skip;
            }
            case expr_kind::call:
            case expr_kind::negate:
            case expr_kind::group:
            case expr_kind::add:
            case expr_kind::subtract:
            case expr_kind::multiply:
            case expr_kind::divide:
            case expr_kind::power:
                return search_step::descend;
            default:
                return search_step::found;
            }
        });
    if (not_for_this_rule)
        return;
    if (c.pis > 0) {
        report_half_of_two_pi(f, c);
        return;
    }
    if (c.speeds >= 1 &&
        (c.angular_speeds >= 1 || (c.inertias >= 1 && is_rotating_power_or_torque(sides_dim)))) {
        report_revolutions_beside_radians(f, c.speed, c.partner, c.angular_speeds >= 1);
        return;
    }
    // Only a speed in revolutions (rpm, rev/s): a frequency in Hz over a diameter is a
    // vortex shedding or an acoustic mode, f = St·V/d (Blevins, Flow-Induced Vibration, 2nd
    // ed., ch. 3, from memory), with no π in it.
    if (c.speeds == 1 && c.rim_speeds == 1 && c.lengths == 1 && c.torques == 0 && c.powers == 0 &&
        c.energies == 0 && c.angular_speeds == 0 && c.inertias == 0 && c.other_numbers == 0 &&
        c.length_round != round_length::none && c.speed.unit.find("Hz") == std::string_view::npos) {
        report_rim_speed_without_pi(f, c.speed, c.rim, c.length,
                                    c.length_round == round_length::radius);
        return;
    }
    // X_C = 1/(2π·f·C), Q_c = 2π·f·C·V²: a capacitor's or reactor's reactance takes the
    // angular frequency ω = 2π·f (IEC 60050-131, from memory). Only with a reactance or a
    // reactive power in the formula: a switching loss C·V²·f in W needs no 2π.
    if (c.speeds == 1 && c.capacitors == 1 && c.angular_speeds == 0 &&
        (c.reactives >= 1 || sides_dim == resistance_dim) && c.torques == 0 && c.rim_speeds == 0) {
        warn_of_missing_pi(
            f,
            fmt::format("{} is a frequency in cycles ({}), and a capacitor's or reactor's "
                        "reactance takes the angular frequency ω = 2π·f "
                        "(X_C = 1/(2π·f·C), Q = 2π·f·C·V²); "
                        "this formula has no 2π, so it is off by 6.28319",
                        c.speed.shown(), c.speed.unit),
            "write 2*pi*f, or declare the angular frequency in rad/s");
        return;
    }
    // T = Δp·V_g/(2π): a hydraulic motor's displacement is per revolution, 2π radians
    // (ISO 4391, from memory); a pump's flow V_g·n needs no 2π, and has a speed beside it.
    if (c.displacements == 1 && c.torques == 1 && c.pressures >= 1 && c.speeds == 0 &&
        c.powers == 0 && c.energies == 0 && c.angular_speeds == 0) {
        warn_of_missing_pi(
            f,
            fmt::format("{} is a torque ({}) from a displacement per revolution: a motor's "
                        "torque is Δp·V_g/(2π), the 2π radians of each "
                        "revolution, and this formula has no 2π, so it is off by 6.28319",
                        c.torque.shown(), c.torque.unit),
            "revolutions count as cycles: divide by 2*pi (T = Δp*V_g/(2*pi))");
        return;
    }
    if (c.torques != 1 || c.speeds != 1 || c.powers != 1 || c.energies != 0)
        return;
    warn_of_missing_pi(
        f,
        fmt::format("{} is a torque ({}) and {} a speed in revolutions ({}): power and "
                    "torque meet through the 2\u03C0 radians of each revolution, P = "
                    "2\u03C0\u00B7n\u00B7M, and this formula has no 2\u03C0, so it is "
                    "off by 6.28319",
                    c.torque.shown(), c.torque.unit, c.speed.shown(), c.speed.unit),
        "revolutions count as cycles: write 2*pi*n for the angular speed "
        "(M = 60000*P/(2*pi*n) in N·m from kW and rpm is M = 9549*P/n), or "
        "declare the speed in rad/s");
}

// "n_d = v/D" in rpm from a rope speed and a drum's diameter: a point on the rim travels
// π·D per revolution, v = π·D·n (2π·r·n with a radius), which the units cannot say. Only
// for a length named as a diameter or a radius (names_a_diameter_or_radius): a screw's
// pitch, a chain's or a stroke travel without π (v = p·n).
void checker::report_rim_speed_without_pi(const syntax::formula& f, const rotating_part& speed,
                                          const rotating_part& rim, const rotating_part& length,
                                          bool radius) {
    warn_of_missing_pi(
        f,
        fmt::format("{} is a speed in revolutions ({}) and {} a speed along the rim of "
                    "{}: a point on the rim travels {} per revolution, and this formula "
                    "has no π, so it is off by {}",
                    speed.shown(), speed.unit, rim.shown(), length.shown(), radius ? "2π·r" : "π·D",
                    radius ? "6.28319" : "3.14159"),
        file_.functions == syntax::function_names::spreadsheet
            ? fmt::format("put the {} in: multiply by {}PI(), with this formula's unit "
                          "conversions kept beside it (a speed in revolutions counts cycles)",
                          radius ? "2\u03C0" : "\u03C0", radius ? "2*" : "")
            : fmt::format("put the {} in: {} = {}*{}*{}, with this formula's unit "
                          "conversions kept beside it (a speed in revolutions counts cycles)",
                          radius ? "2\u03C0" : "\u03C0", rim.name, radius ? "2*pi" : "pi",
                          length.name, speed.name));
}

// "ω = π*n/60", "P = T*π*n/60000": the 2 of 2π left out, where π/30 (2π/60) was meant. Only
// with π alone, no other number than unit conversions beside it (a 2, a 30, a 4 of a circle
// make it some other formula), and no rim or diameter (v = π·D·n takes π alone).
void checker::report_half_of_two_pi(const syntax::formula& f, const rotation_census& c) {
    if (c.pis != 1 || c.speeds != 1 || c.numbers_not_clock_conversions != 0 || c.rim_speeds != 0 ||
        c.lengths != 0 || c.inertias != 0 || c.energies != 0 || c.displacements != 0 ||
        c.capacitors != 0)
        return;
    const bool radians = c.angular_speeds == 1 && c.torques == 0 && c.powers == 0;
    const bool power = c.angular_speeds == 0 && c.torques == 1 && c.powers == 1;
    if (!radians && !power)
        return;
    const std::string meets =
        radians ? fmt::format("{} an angular speed in radians ({}): a revolution is 2\u03C0 "
                              "radians",
                              c.partner.shown(), c.partner.unit)
                : fmt::format("{} a torque ({}): power and torque meet through the 2\u03C0 "
                              "radians of each revolution, P = 2\u03C0\u00B7n\u00B7M",
                              c.torque.shown(), c.torque.unit);
    warn_of_missing_pi(f,
                       fmt::format("{} is a speed in revolutions ({}) and {}, and this formula "
                                   "has \u03C0 alone, so it is half its true value",
                                   c.speed.shown(), c.speed.unit, meets),
                       "write 2*pi*n/60 for the angular speed in rad/s from rpm (or pi*n/30, "
                       "the 2 taken into the 60)");
}

void checker::report_revolutions_beside_radians(const syntax::formula& f,
                                                const rotating_part& speed,
                                                const rotating_part& partner, bool angular) {
    const std::string partner_is =
        angular ? fmt::format("{} an angular speed in radians ({})", partner.shown(), partner.unit)
                : fmt::format("{} a moment of inertia ({}), whose kinetic energy "
                              "\u00BDI\u03C9\u00B2 takes the speed in radians",
                              partner.shown(), partner.unit);
    warn_of_missing_pi(
        f,
        fmt::format("{} is a speed in revolutions ({}) and {}: a revolution is 2\u03C0 "
                    "radians, and this formula has no 2\u03C0, so it is off by {}",
                    speed.shown(), speed.unit, partner_is,
                    angular ? "6.28319" : "6.28319 for each power of the speed"),
        "revolutions count as cycles: the angular speed is \u03C9 = 2*pi*n "
        "(2*pi*n/60 in rad/s from rpm), or declare the speed in rad/s");
}

} // namespace plumb::formula_check
