// Characteristic numbers recognised from the dimensions of a group's variables, and the
// recombination of a basis of groups into the numbers engineers quote.
//
// A named number is known here by its defining quantities' dimensions and exponents (its
// "signature"), never by its symbol. Numeric factors such as the ½ of ½ρv² in the drag and
// pressure coefficients are not part of a group: groups are products of variables only, so a
// coefficient and the group without its ½ are the same group.
#include "plumb/groups.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <initializer_list>
#include <iterator>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace plumb {
namespace {

using exponents = std::array<std::int8_t, base_dimension_count>;

constexpr exponents dims(int m, int l, int t, int th = 0) {
    return {static_cast<std::int8_t>(m), static_cast<std::int8_t>(l), static_cast<std::int8_t>(t),
            static_cast<std::int8_t>(th)};
}

// Dimensions of the defining quantities, M L T Θ.
constexpr exponents length = dims(0, 1, 0);
constexpr exponents area = dims(0, 2, 0);
constexpr exponents time_ = dims(0, 0, 1);
// Frequency, and angular speed N in rev/s or rad/s alike: the turn and the radian are 1.
constexpr exponents frequency = dims(0, 0, -1);
constexpr exponents speed = dims(0, 1, -1);
constexpr exponents acceleration = dims(0, 1, -2);
constexpr exponents flow_rate = dims(0, 3, -1);
constexpr exponents diffusivity = dims(0, 2, -1); // kinematic viscosity, a, D alike
constexpr exponents density = dims(1, -3, 0);
constexpr exponents viscosity = dims(1, -1, -1); // dynamic
constexpr exponents pressure = dims(1, -1, -2);  // also moduli of elasticity
constexpr exponents surface_tension = dims(1, 0, -2);
constexpr exponents force = dims(1, 1, -2);
constexpr exponents power = dims(1, 2, -3);
constexpr exponents torque = dims(1, 2, -2);
constexpr exponents specific_energy = dims(0, 2, -2); // gH as one variable
constexpr exponents temperature = dims(0, 0, 0, 1);
constexpr exponents expansion = dims(0, 0, 0, -1); // thermal expansion coefficient
// Gravity times the expansion coefficient, gβ, as one variable: with the Boussinesq
// approximation the two occur only as that product.
constexpr exponents buoyancy = dims(0, 1, -2, -1);
constexpr exponents heat_transfer = dims(1, 0, -3, -1);
constexpr exponents conductivity = dims(1, 1, -3, -1);
constexpr exponents specific_heat = dims(0, 2, -2, -1);

// Dimension alone cannot tell ν from a or D, k_fluid from k_solid, or a roughness from a
// diameter. A hint says which quantity a slot stands for, so a variable's conventional name can
// order equally good readings; it never makes a reading on its own (except where noted).
enum class hint : std::uint8_t {
    none,
    kinematic_viscosity,
    thermal_diffusivity,
    mass_diffusivity,
    mass_transfer_coefficient,
    speed_of_sound,
    mean_free_path,
    roughness,
    fluid_conductivity,
    solid_conductivity,
    drag_force,
    lift_force,
    pressure_difference,
    modulus,
    rotational_speed,
};

struct slot {
    exponents dim{};
    std::int8_t num = 0; // exponent num/den in the defining formula
    std::int8_t den = 1;
    hint role = hint::none;
};

constexpr slot q(exponents d, int num, hint role = hint::none) {
    return {d, static_cast<std::int8_t>(num), 1, role};
}
constexpr slot half(exponents d, int num) {
    return {d, static_cast<std::int8_t>(num), 2};
}

constexpr std::size_t max_slots = 8;

enum class kind : std::uint8_t {
    plain,
    // Only a name can tell a mean free path or a roughness from any other length, so these
    // readings are offered only when a variable's name suggests them, on top of the dimensional
    // match; without it the generic reading stands.
    needs_hint,
    // Describes the dimension only ("ratio of two lengths"); never listed as an alternative.
    generic,
};

struct definition {
    std::string_view number;
    std::array<slot, max_slots> slots{};
    std::size_t count = 0;
    // What the form is by dimension, shown when more than one number fits.
    std::string_view phrase;
    kind k = kind::plain;
    // How this form departs from the defining one; "{}" is the variable in note_slot.
    std::string_view note;
    std::size_t note_slot = 0;
};

constexpr definition def(std::string_view number, std::initializer_list<slot> slots,
                         std::string_view phrase = {}, kind k = kind::plain) {
    definition d;
    d.number = number;
    d.phrase = phrase;
    d.k = k;
    for (const slot& s : slots)
        d.slots[d.count++] = s; // more than max_slots fails to compile: out of range
    return d;
}

constexpr definition noted(definition d, std::string_view note, std::size_t note_slot) {
    d.note = note;
    d.note_slot = note_slot;
    return d;
}

constexpr std::string_view diffusion_ratio = "a ratio of two diffusivities";
constexpr std::string_view diffusion_ratio_eta = "a ratio of two diffusivities, one as η/ρ";
constexpr std::string_view diffusion_ratio_lambda = "a ratio of two diffusivities, one as λ/(ρc_p)";
constexpr std::string_view transport = "a speed times a length over a diffusivity";
constexpr std::string_view rotational_transport =
    "a rotational speed times a length squared over a diffusivity";
constexpr std::string_view length_ratio = "a ratio of two lengths";
constexpr std::string_view dynamic_pressure = "a pressure over ρv²";
constexpr std::string_view force_area = "a force over ρv² times an area";
constexpr std::string_view conduction = "a heat transfer coefficient times a length over a "
                                        "thermal conductivity";

// Sources: ISO 80000-11:2019 for the characteristic numbers it defines (item numbers marked
// "from memory" were not checked against the text); the drag, lift, pressure and
// turbomachine coefficients and relative roughness are common practice in fluid mechanics
// texts. Several forms of one number cover the ways a problem may list its variables (η and ρ
// or ν; a or λ, ρ and c_p). Candidates are listed in this order when nothing else decides.
constexpr definition table[] = {
    // ISO 80000-11:2019, item 11-4.1: Re = ρvl/η = vl/ν.
    def("Reynolds number", {q(density, 1), q(speed, 1), q(length, 1), q(viscosity, -1)}),
    def("Reynolds number",
        {q(speed, 1), q(length, 1), q(diffusivity, -1, hint::kinematic_viscosity)}, transport),
    // Common practice for pumps and fans (F. M. White, Fluid Mechanics, 7th ed., ch. 11, from
    // memory): the rotational Reynolds number ρND²/μ = ND²/ν, N a rotational speed, ND taking
    // the place of the speed.
    noted(def("Reynolds number", {q(density, 1), q(frequency, 1), q(length, 2), q(viscosity, -1)}),
          "rotational, ρND²/μ", max_slots),
    noted(def("Reynolds number",
              {q(frequency, 1), q(length, 2), q(diffusivity, -1, hint::kinematic_viscosity)},
              rotational_transport),
          "rotational, ND²/ν", max_slots),
    // ISO 80000-11:2019, item 11-4.2 (from memory): Eu = Δp/(ρv²).
    def("Euler number", {q(pressure, 1, hint::pressure_difference), q(density, -1), q(speed, -2)},
        dynamic_pressure),
    // Common practice: C_p = (p − p∞)/(½ρv²), the Euler number's group.
    def("pressure coefficient",
        {q(pressure, 1, hint::pressure_difference), q(density, -1), q(speed, -2)},
        dynamic_pressure),
    // ISO 80000-11:2019, clause 4 (item number from memory): Cy = ρv²/K, K a modulus.
    def("Cauchy number", {q(density, 1), q(speed, 2), q(pressure, -1, hint::modulus)},
        "ρv² over a pressure or modulus"),
    // ISO 80000-11:2019, item 11-4.3 (from memory): Fr = v/√(lg); v²/(lg) is its square.
    def("Froude number", {q(speed, 1), half(acceleration, -1), half(length, -1)}),
    // ISO 80000-11:2019, item 11-4.5 (from memory): We = ρv²l/γ.
    def("Weber number", {q(density, 1), q(speed, 2), q(length, 1), q(surface_tension, -1)}),
    // ISO 80000-11:2019, item 11-4.6 (from memory): Ma = v/c. The speed of sound enters no
    // other number here, so any ratio of two speeds reads as a Mach number.
    def("Mach number", {q(speed, 1), q(speed, -1, hint::speed_of_sound)}, "a ratio of two speeds"),
    // ISO 80000-11:2019, item 11-4.8 (from memory): Sr = lf/v.
    def("Strouhal number", {q(length, 1), q(frequency, 1), q(speed, -1)}),
    def("ratio of two lengths", {q(length, 1), q(length, -1)}, length_ratio, kind::generic),
    // ISO 80000-11:2019, item 11-4.7 (from memory): Kn = λ/l, λ the mean free path.
    def("Knudsen number", {q(length, 1, hint::mean_free_path), q(length, -1)}, length_ratio,
        kind::needs_hint),
    // Common practice (the Moody chart): ε/D.
    def("relative roughness", {q(length, 1, hint::roughness), q(length, -1)}, length_ratio,
        kind::needs_hint),
    // ISO 80000-11:2019, clause 4 (item number from memory): Ca = ηv/γ.
    def("capillary number", {q(viscosity, 1), q(speed, 1), q(surface_tension, -1)}),
    // ISO 80000-11:2019, clause 4 (item number from memory): Eo = Δρgl²/γ; ρ or Δρ alike.
    def("Bond (Eötvös) number",
        {q(density, 1), q(acceleration, 1), q(length, 2), q(surface_tension, -1)}),
    // Common practice (ISO 80000-11:2019 lists it too, from memory): Ga = gl³/ν².
    // Only a kinematic viscosity makes gl³/ν² the Galilei number: gl³/a², with a thermal
    // diffusivity, is no number of its own.
    def("Galilei number",
        {q(acceleration, 1), q(length, 3), q(diffusivity, -2, hint::kinematic_viscosity)}, {},
        kind::needs_hint),
    def("Galilei number", {q(acceleration, 1), q(length, 3), q(density, 2), q(viscosity, -2)}),
    // Common practice (ISO 80000-11:2019 lists it too, from memory): Ar = gl³Δρ/(ρν²).
    def("Archimedes number",
        {q(acceleration, 1), q(length, 3), q(density, 1), q(density, -1), q(diffusivity, -2)}),
    def("Archimedes number",
        {q(acceleration, 1), q(length, 3), q(density, 1), q(density, 1), q(viscosity, -2)}),
    // ISO 80000-11:2019, item 11-4.4 (from memory): Gr = l³gα_VΔT/ν².
    def("Grashof number", {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1),
                           q(diffusivity, -2, hint::kinematic_viscosity)}),
    def("Grashof number", {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1),
                           q(density, 2), q(viscosity, -2)}),
    // The same with gβ as one variable, the way the Boussinesq approximation leaves it.
    def("Grashof number", {q(buoyancy, 1), q(length, 3), q(temperature, 1),
                           q(diffusivity, -2, hint::kinematic_viscosity)}),
    def("Grashof number",
        {q(buoyancy, 1), q(length, 3), q(temperature, 1), q(density, 2), q(viscosity, -2)}),
    // ISO 80000-11:2019, item 11-5.3 (from memory): Ra = l³gα_VΔT/(νa), with ν as η/ρ and a
    // as λ/(ρc_p) where a problem lists those instead: Gr·Pr in every spelling.
    def("Rayleigh number", {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1),
                            q(diffusivity, -1, hint::kinematic_viscosity),
                            q(diffusivity, -1, hint::thermal_diffusivity)}),
    def("Rayleigh number",
        {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1), q(density, 1),
         q(viscosity, -1), q(diffusivity, -1, hint::thermal_diffusivity)}),
    def("Rayleigh number",
        {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1), q(density, 1),
         q(specific_heat, 1), q(diffusivity, -1, hint::kinematic_viscosity), q(conductivity, -1)}),
    def("Rayleigh number",
        {q(acceleration, 1), q(length, 3), q(expansion, 1), q(temperature, 1), q(density, 2),
         q(specific_heat, 1), q(viscosity, -1), q(conductivity, -1)}),
    // And with gβ as one variable: gβΔTl³/(νa).
    def("Rayleigh number", {q(buoyancy, 1), q(length, 3), q(temperature, 1),
                            q(diffusivity, -1, hint::kinematic_viscosity),
                            q(diffusivity, -1, hint::thermal_diffusivity)}),
    // ISO 80000-11:2019, item 11-5.1 (from memory): Fo = at/l².
    def("Fourier number", {q(diffusivity, 1), q(time_, 1), q(length, -2)}),
    def("Fourier number",
        {q(conductivity, 1), q(time_, 1), q(density, -1), q(specific_heat, -1), q(length, -2)}),
    // ISO 80000-11:2019, item 11-5.2 (from memory): Pe = vl/a = vlρc_p/λ.
    def("Péclet number", {q(speed, 1), q(length, 1), q(diffusivity, -1, hint::thermal_diffusivity)},
        transport),
    def("Péclet number",
        {q(speed, 1), q(length, 1), q(density, 1), q(specific_heat, 1), q(conductivity, -1)}),
    // ISO 80000-11:2019, clause 6 (item number from memory): Sh = kl/D.
    def("Sherwood number",
        {q(speed, 1, hint::mass_transfer_coefficient), q(length, 1),
         q(diffusivity, -1, hint::mass_diffusivity)},
        transport),
    // ISO 80000-11:2019, item 11-7.1 (from memory): Pr = η/(ρa); also ν/a and ηc_p/λ.
    def("Prandtl number",
        {q(diffusivity, 1, hint::kinematic_viscosity),
         q(diffusivity, -1, hint::thermal_diffusivity)},
        diffusion_ratio),
    def("Prandtl number",
        {q(viscosity, 1), q(density, -1), q(diffusivity, -1, hint::thermal_diffusivity)},
        diffusion_ratio_eta),
    def("Prandtl number", {q(viscosity, 1), q(specific_heat, 1), q(conductivity, -1)}),
    def("Prandtl number",
        {q(diffusivity, 1, hint::kinematic_viscosity), q(density, 1), q(specific_heat, 1),
         q(conductivity, -1)},
        diffusion_ratio_lambda),
    // ISO 80000-11:2019, item 11-7.2 (from memory): Sc = η/(ρD) = ν/D.
    def("Schmidt number",
        {q(diffusivity, 1, hint::kinematic_viscosity), q(diffusivity, -1, hint::mass_diffusivity)},
        diffusion_ratio),
    def("Schmidt number",
        {q(viscosity, 1), q(density, -1), q(diffusivity, -1, hint::mass_diffusivity)},
        diffusion_ratio_eta),
    // ISO 80000-11:2019, item 11-7.3 (from memory): Le = a/D = λ/(ρc_pD).
    def("Lewis number",
        {q(diffusivity, 1, hint::thermal_diffusivity), q(diffusivity, -1, hint::mass_diffusivity)},
        diffusion_ratio),
    def("Lewis number",
        {q(conductivity, 1), q(density, -1), q(specific_heat, -1),
         q(diffusivity, -1, hint::mass_diffusivity)},
        diffusion_ratio_lambda),
    // ISO 80000-11:2019, item 11-5.4 (from memory): Nu = Kl/λ, λ of the fluid.
    def("Nusselt number",
        {q(heat_transfer, 1), q(length, 1), q(conductivity, -1, hint::fluid_conductivity)},
        conduction),
    // ISO 80000-11:2019, clause 5 (item number from memory): Bi = Kl/λ_b, λ_b of the body.
    def("Biot number",
        {q(heat_transfer, 1), q(length, 1), q(conductivity, -1, hint::solid_conductivity)},
        conduction),
    // ISO 80000-11:2019, clause 5 (item number from memory): St = K/(ρvc_p).
    def("Stanton number",
        {q(heat_transfer, 1), q(density, -1), q(speed, -1), q(specific_heat, -1)}),
    // Common practice: C_D = F_D/(½ρv²A), C_L = F_L/(½ρv²A); problems often give a length
    // (a diameter, a chord) where the area belongs.
    def("drag coefficient",
        {q(force, 1, hint::drag_force), q(density, -1), q(speed, -2), q(area, -1)}, force_area),
    noted(def("drag coefficient",
              {q(force, 1, hint::drag_force), q(density, -1), q(speed, -2), q(length, -2)}),
          "area taken as {}²", 3),
    def("lift coefficient",
        {q(force, 1, hint::lift_force), q(density, -1), q(speed, -2), q(area, -1)}, force_area),
    noted(def("lift coefficient",
              {q(force, 1, hint::lift_force), q(density, -1), q(speed, -2), q(length, -2)}),
          "area taken as {}²", 3),
    // Common practice for pumps and fans: Q/(ND³), gH/(N²D²), P/(ρN³D⁵).
    def("flow coefficient", {q(flow_rate, 1), q(frequency, -1), q(length, -3)}),
    def("head coefficient", {q(acceleration, 1), q(length, 1), q(frequency, -2), q(length, -2)}),
    def("head coefficient", {q(specific_energy, 1), q(frequency, -2), q(length, -2)}),
    noted(
        def("head coefficient", {q(pressure, 1), q(density, -1), q(frequency, -2), q(length, -2)}),
        "a pressure rise in place of ρgH", max_slots),
    // Called the power number where it describes the power drawn by a pump, fan or stirrer.
    def("power number", {q(power, 1), q(density, -1), q(frequency, -3), q(length, -5)}),
    // Propellers: J. Carlton, Marine Propellers and Propulsion, 2nd ed., Butterworth-Heinemann,
    // 2007, ch. 6 (open-water characteristics; chapter from memory): the advance ratio
    // J = V_a/(nD), the thrust coefficient K_T = T/(ρn²D⁴), the torque coefficient
    // K_Q = Q/(ρn²D⁵). V/(nD) has the dimensions of an inverse Strouhal number, so only a
    // rotational speed by name (n, N, ω) makes it an advance ratio.
    def("advance ratio", {q(speed, 1), q(frequency, -1, hint::rotational_speed), q(length, -1)},
        "a speed over a rotational speed times a length", kind::needs_hint),
    def("thrust coefficient", {q(force, 1), q(density, -1), q(frequency, -2), q(length, -4)}),
    def("torque coefficient", {q(torque, 1), q(density, -1), q(frequency, -2), q(length, -5)}),
    // Common practice for weirs and spillways: the discharge group Q/√(gH⁵), H a head or height.
    // It is the discharge coefficient of the V-notch weir equation
    // Q = (8/15)·C_d·√(2g)·tan(θ/2)·H^(5/2) but for the constant factors (e.g. Munson et al.,
    // Fundamentals of Fluid Mechanics, 6th ed., Sec. 10.6, from memory); for a rectangular weir
    // of width b it is C_w·b/H, C_w of Q = C_w·b·√g·H^(3/2).
    noted(def("discharge coefficient", {q(flow_rate, 1), half(acceleration, -1), half(length, -5)}),
          "Q/√(gH⁵)", max_slots),
};

// A wrong exponent in the table would name groups that are not dimensionless.
constexpr bool every_definition_dimensionless() {
    for (const definition& d : table)
        for (std::size_t b = 0; b < base_dimension_count; ++b) {
            int twice = 0; // exponents are whole or halves
            for (std::size_t s = 0; s < d.count; ++s)
                twice += d.slots[s].dim[b] * d.slots[s].num * (2 / d.slots[s].den);
            if (twice != 0)
                return false;
        }
    return true;
}
static_assert(every_definition_dimensionless(), "a named number's definition has a dimension");

// ---- Hints from names --------------------------------------------------------------------

bool one_of(std::string_view s, std::initializer_list<std::string_view> options) {
    return std::find(options.begin(), options.end(), s) != options.end();
}

// The names are the symbols texts use; a variable written "alpha" or "α_f" counts as α.
bool suggests(hint h, std::string_view name) {
    const std::size_t bar = name.find('_');
    const std::string_view base = name.substr(0, bar);
    const std::string_view sub = bar == std::string_view::npos ? "" : name.substr(bar + 1);
    switch (h) {
    case hint::none:
        return false;
    case hint::kinematic_viscosity:
        return one_of(base, {"ν", "nu"});
    case hint::thermal_diffusivity:
        return one_of(base, {"α", "alpha", "a", "κ", "kappa"});
    case hint::mass_diffusivity:
        return one_of(base, {"D", "𝒟", "Dab", "DAB", "Dm"});
    case hint::mass_transfer_coefficient:
        return base == "k" || (one_of(base, {"h", "β"}) && one_of(sub, {"m", "D", "c"}));
    case hint::speed_of_sound:
        return one_of(base, {"c", "a", "c0", "a0"});
    case hint::mean_free_path:
        return one_of(base, {"λ", "lambda", "mfp", "ℓ"}) || sub == "mfp";
    case hint::roughness:
        return one_of(base, {"ε", "epsilon", "eps", "e"}) || one_of(name, {"k_s", "ks"}) ||
               name.find("rough") != std::string_view::npos;
    case hint::fluid_conductivity:
        return one_of(base, {"k", "λ", "lambda"}) && one_of(sub, {"f", "fl", "fluid"});
    case hint::solid_conductivity:
        return one_of(base, {"k", "λ", "lambda"}) &&
               one_of(sub, {"s", "b", "w", "solid", "body", "wall"});
    case hint::drag_force:
        return one_of(base, {"D", "drag"}) || (base == "F" && one_of(sub, {"D", "d", "drag"}));
    case hint::lift_force:
        return one_of(base, {"L", "lift"}) || (base == "F" && one_of(sub, {"L", "l", "lift"}));
    case hint::pressure_difference:
        return one_of(base, {"p", "P", "Δp", "ΔP", "dp", "dP"}) || name == "delta_p";
    case hint::modulus:
        return one_of(base, {"K", "E", "B", "G"});
    case hint::rotational_speed:
        return one_of(base, {"n", "N", "ω", "Ω", "omega", "rpm", "rps"});
    }
    return false;
}

// ---- Matching ----------------------------------------------------------------------------

// The powers a group may be of a named number, in order of preference; also the powers tried
// when recombining basis groups.
constexpr std::array<std::array<int, 2>, 6> powers = {
    {{1, 1}, {-1, 1}, {2, 1}, {-2, 1}, {1, 2}, {-1, 2}}};

struct candidate {
    std::size_t definition = 0; // index into table
    rational power;
    std::size_t power_rank = 0; // index into powers
    int score = 0;              // slots whose variable's name suggests their quantity
    std::array<std::size_t, max_slots> variable_of_slot{};
};

struct item {
    std::size_t variable;
    rational exponent;
};

bool same_dimension(const dimension& d, const exponents& e) {
    for (std::size_t b = 0; b < base_dimension_count; ++b)
        if (d.exponent(static_cast<base_dimension>(b)) != rational(e[b]))
            return false;
    return true;
}

// A dimension's exponents when they are whole and small enough for a form's slot; empty when
// not, since no form then fits.
std::optional<exponents> small_exponents(const dimension& d) {
    exponents e{};
    for (std::size_t b = 0; b < base_dimension_count; ++b) {
        const rational x = d.exponent(static_cast<base_dimension>(b));
        if (!x.is_integer() || x.num() < -127 || x.num() > 127)
            return std::nullopt;
        e[b] = static_cast<std::int8_t>(x.num());
    }
    return e;
}

// Per form of the table, its slots' dimensions in sorted order.
const std::vector<std::array<exponents, max_slots>>& sorted_slot_dimensions() {
    static const std::vector<std::array<exponents, max_slots>> sorted = [] {
        std::vector<std::array<exponents, max_slots>> out;
        for (const definition& d : table) {
            std::array<exponents, max_slots> dims{};
            for (std::size_t s = 0; s < d.count; ++s)
                dims[s] = d.slots[s].dim;
            std::sort(dims.begin(), dims.begin() + static_cast<std::ptrdiff_t>(d.count));
            out.push_back(dims);
        }
        return out;
    }();
    return sorted;
}

// The best-scoring one-to-one assignment of the group's variables to a form's slots.
class assignment_search {
  public:
    assignment_search(const definition& d, rational p, std::span<const item> items,
                      std::span<const group_variable> variables)
        : d_(d), items_(items), variables_(variables) {
        for (std::size_t s = 0; s < d.count; ++s) {
            const rational wanted = rational(d.slots[s].num, d.slots[s].den) * p;
            for (std::size_t i = 0; i < items.size(); ++i)
                fits_[s][i] = items[i].exponent == wanted &&
                              same_dimension(variables[items[i].variable].dim, d.slots[s].dim);
        }
    }

    // Highest score, or -1 when no assignment fits.
    int run() {
        place(0, 0, 0);
        return best_;
    }
    [[nodiscard]] const std::array<std::size_t, max_slots>& best() const { return best_slots_; }

  private:
    void place(std::size_t s, std::uint32_t used, int score) {
        if (s == d_.count) {
            if (score > best_) {
                best_ = score;
                best_slots_ = current_;
            }
            return;
        }
        for (std::size_t i = 0; i < items_.size(); ++i) {
            if ((used & (1U << i)) != 0 || !fits_[s][i])
                continue;
            current_[s] = items_[i].variable;
            const bool hinted = suggests(d_.slots[s].role, variables_[items_[i].variable].name);
            place(s + 1, used | (1U << i), score + (hinted ? 1 : 0));
        }
    }

    const definition& d_;
    std::span<const item> items_;
    std::span<const group_variable> variables_;
    std::array<std::array<bool, max_slots>, max_slots> fits_{};
    std::array<std::size_t, max_slots> current_{};
    std::array<std::size_t, max_slots> best_slots_{};
    int best_ = -1;
};

// Every named number the group may be, best first: names that suggest the quantities first,
// then plain numbers before inverses and powers, then table order.
// `items` are the group's nonzero exponents in variable order.
std::vector<candidate> candidates_for_items(std::span<const group_variable> variables,
                                            std::span<const item> items) {
    std::vector<candidate> found;
    if (items.empty() || items.size() > max_slots)
        return found;
    // A form fits only if its slots' dimensions are the items' dimensions, one for one,
    // whatever the power: comparing the two sorted lists first spares the assignment search
    // for nearly every form, which matters when a large study tries thousands of combinations.
    std::array<exponents, max_slots> have{};
    for (std::size_t k = 0; k < items.size(); ++k) {
        const std::optional<exponents> e = small_exponents(variables[items[k].variable].dim);
        if (!e)
            return found; // a fractional or large exponent: no form has it
        have[k] = *e;
    }
    std::sort(have.begin(), have.begin() + static_cast<std::ptrdiff_t>(items.size()));
    const auto& slot_dimensions = sorted_slot_dimensions();

    for (std::size_t d = 0; d < std::size(table); ++d) {
        const definition& form = table[d];
        if (form.count != items.size() ||
            !std::equal(have.begin(), have.begin() + static_cast<std::ptrdiff_t>(form.count),
                        slot_dimensions[d].begin()))
            continue;
        std::optional<candidate> best;
        for (std::size_t r = 0; r < powers.size(); ++r) {
            const rational p(powers[r][0], powers[r][1]);
            assignment_search search(form, p, items, variables);
            const int score = search.run();
            // A ratio of like quantities fits both ways; names decide which way round it is,
            // and without them it is taken the plain way.
            if (score < 0 || (best && score <= best->score))
                continue;
            best = candidate{d, p, r, score, search.best()};
        }
        if (!best || (form.k == kind::needs_hint && best->score == 0))
            continue;
        // One entry per number: its best-fitting form.
        const auto same = std::find_if(found.begin(), found.end(), [&](const candidate& c) {
            return table[c.definition].number == form.number;
        });
        if (same == found.end())
            found.push_back(*best);
        else if (best->score > same->score ||
                 (best->score == same->score && best->power_rank < same->power_rank))
            *same = *best;
    }
    std::stable_sort(found.begin(), found.end(), [](const candidate& a, const candidate& b) {
        if (a.score != b.score)
            return a.score > b.score;
        return a.power_rank < b.power_rank;
    });
    return found;
}

std::vector<candidate> candidates_for(std::span<const group_variable> variables,
                                      std::span<const rational> exponents) {
    if (variables.size() != exponents.size())
        return {};
    std::vector<item> items;
    for (std::size_t v = 0; v < variables.size(); ++v)
        if (!exponents[v].is_zero())
            items.push_back({v, exponents[v]});
    return candidates_for_items(variables, items);
}

// ---- Wording -----------------------------------------------------------------------------

std::string power_prefix(std::size_t power_rank, bool article) {
    const std::string the = article ? "the " : "";
    switch (power_rank) {
    case 0:
        return the;
    case 1:
        return the + "inverse of the ";
    case 2:
        return the + "square of the ";
    case 3:
        return the + "inverse square of the ";
    case 4:
        return the + "square root of the ";
    default:
        return the + "inverse square root of the ";
    }
}

std::string join_or(const std::vector<std::string>& parts) {
    std::string out;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        if (i > 0)
            out += i + 1 == parts.size() ? " or " : ", ";
        out += parts[i];
    }
    return out;
}

// "Prandtl, Schmidt or Lewis number": a last word all the names share is said once.
std::string join_names(const std::vector<std::string_view>& names) {
    const auto last_word = [](std::string_view n) { return n.substr(n.rfind(' ') + 1); };
    const std::string_view shared = last_word(names.front());
    const bool common = names.size() > 1 && shared.size() < names.front().size() &&
                        std::all_of(names.begin(), names.end(), [&](std::string_view n) {
                            return n.size() > shared.size() && last_word(n) == shared;
                        });
    std::vector<std::string> parts;
    for (const std::string_view n : names)
        parts.emplace_back(common ? n.substr(0, n.size() - shared.size() - 1) : n);
    std::string out = join_or(parts);
    if (common) {
        out += ' ';
        out += shared;
    }
    return out;
}

// Candidates of one power at a time, in the order given: "the inverse of the Euler number or
// pressure coefficient".
std::string list_by_power(const std::vector<candidate>& cs, bool article) {
    std::vector<std::string> parts;
    std::vector<bool> done(cs.size(), false);
    for (std::size_t i = 0; i < cs.size(); ++i) {
        if (done[i])
            continue;
        std::vector<std::string_view> names;
        for (std::size_t j = i; j < cs.size(); ++j)
            if (!done[j] && cs[j].power_rank == cs[i].power_rank) {
                names.push_back(table[cs[j].definition].number);
                done[j] = true;
            }
        parts.push_back(power_prefix(cs[i].power_rank, article) + join_names(names));
    }
    return join_or(parts);
}

std::string describe(const std::vector<candidate>& cs, std::span<const group_variable> variables) {
    if (cs.empty())
        return {};
    const candidate& top = cs.front();
    const definition& form = table[top.definition];
    std::vector<candidate> winners;
    std::vector<candidate> others;
    for (const candidate& c : cs) {
        if (c.score == top.score && c.power_rank == top.power_rank)
            winners.push_back(c);
        else if (table[c.definition].k != kind::generic)
            others.push_back(c);
    }
    std::string text = list_by_power(winners, false);

    std::vector<std::string> remarks;
    if (!form.note.empty()) {
        std::string note(form.note);
        const std::size_t at = note.find("{}");
        if (at != std::string::npos && form.note_slot < form.count)
            note.replace(at, 2, variables[top.variable_of_slot[form.note_slot]].name);
        remarks.push_back(std::move(note));
    }
    const bool has_hints = std::any_of(form.slots.begin(),
                                       form.slots.begin() + static_cast<std::ptrdiff_t>(form.count),
                                       [](const slot& s) { return s.role != hint::none; });
    // Say what the group is by dimension whenever its name rests on more than dimension.
    const bool open_question = cs.size() > 1 || (has_hints && top.score == 0);
    if (open_question && !form.phrase.empty())
        remarks.emplace_back(form.phrase);
    // When names decided, the other readings are noise; when nothing did, they are the answer.
    if (top.score == 0 && !others.empty())
        remarks.push_back("by dimension also " + list_by_power(others, true));
    if (!remarks.empty()) {
        text += " (";
        for (std::size_t i = 0; i < remarks.size(); ++i)
            text += (i > 0 ? "; " : "") + remarks[i];
        text += ')';
    }
    return text;
}

// ---- Recombination -----------------------------------------------------------------------

// How good a group's name is, lower better: a named number over its inverse over nothing; no
// fractional exponents the basis did not have; then plain, square, square root.
struct quality {
    int tier = 2; // 0 a positive power, 1 an inverse, 2 unnamed
    int fractional = 0;
    std::size_t power_rank = 0;
    friend bool operator<(const quality& a, const quality& b) {
        if (a.tier != b.tier)
            return a.tier < b.tier;
        if (a.fractional != b.fractional)
            return a.fractional < b.fractional;
        return a.power_rank < b.power_rank;
    }
};

quality quality_of(const std::vector<candidate>& cs, bool fractional) {
    quality q;
    if (cs.empty())
        return q;
    q.tier = cs.front().power.num() > 0 ? 0 : 1;
    q.fractional = fractional ? 1 : 0;
    q.power_rank = cs.front().power_rank;
    return q;
}

std::string basis_term(const std::string& formula, rational e) {
    std::string out = "(" + formula + ")";
    const rational magnitude = e < rational(0) ? -e : e;
    if (magnitude == rational(1))
        return out;
    if (magnitude.is_integer())
        return out + "^" + magnitude.to_string();
    return out + "^(" + magnitude.to_string() + ")";
}

// "1/(ρ*V*D/μ)", "(g*L^3/ν^2)·(β*ΔT)" over the groups elimination gave, written out: the reader
// never saw them numbered, since the recombined group takes the place of its first term.
std::string recombination_text(std::vector<std::pair<std::size_t, rational>> terms,
                               const std::vector<std::string>& basis) {
    std::sort(terms.begin(), terms.end(),
              [](const auto& a, const auto& b) { return a.first < b.first; });
    std::string above;
    std::vector<std::string> below;
    for (const auto& [index, e] : terms) {
        if (e.is_zero())
            continue;
        if (rational(0) < e)
            above += (above.empty() ? "" : "·") + basis_term(basis[index], e);
        else
            below.push_back(basis_term(basis[index], e));
    }
    if (above.empty())
        above.push_back('1'); // appended, not assigned: g++ 12 warns falsely on `= "1"` (PR 105651)
    if (below.empty())
        return above;
    if (below.size() == 1)
        return above + "/" + below.front();
    return above + "/(" + below[0] + "·" + below[1] + ")";
}

struct recombination {
    std::vector<rational> exponents;
    std::vector<std::pair<std::size_t, rational>> terms;
    quality q;
};

// The largest number of groups whose every pair fits within `max_pairs` (each group is tried
// with each of the others).
std::size_t named_in_full(std::size_t max_pairs) {
    std::size_t n = 1;
    while ((n + 1) * (n + 1) <= max_pairs)
        ++n;
    return n;
}

} // namespace

std::vector<named_group_match> recognise_group(std::span<const group_variable> variables,
                                               std::span<const rational> exponents) {
    std::vector<named_group_match> out;
    for (const candidate& c : candidates_for(variables, exponents))
        out.push_back({table[c.definition].number, c.power});
    return out;
}

void name_groups(group_analysis& analysis, std::span<const group_variable> variables,
                 std::size_t max_pairs) {
    std::vector<pi_group>& groups = analysis.groups;
    const std::size_t n = groups.size();
    for (const pi_group& g : groups)
        if (g.exponents.size() != variables.size())
            return;

    // The dependent variable: in its group to the first power and in no other. It must stay
    // that way, so it is found once the result is solved for.
    std::vector<std::size_t> dependents;
    for (std::size_t gi = 0; gi < n; ++gi) {
        if (!groups[gi].has_dependent)
            continue;
        for (std::size_t v = 0; v < variables.size(); ++v) {
            if (groups[gi].exponents[v] != rational(1))
                continue;
            bool alone = true;
            for (std::size_t other = 0; other < n; ++other)
                if (other != gi && !groups[other].exponents[v].is_zero())
                    alone = false;
            if (alone)
                dependents.push_back(v);
        }
    }
    // Combinations are worked on their nonzero exponents only: a group has one variable of its
    // own and the repeating ones, so a pair of groups touches a handful of variables however
    // many the study has.
    const auto exponent_in = [](const std::vector<item>& e, std::size_t v) {
        const auto it = std::lower_bound(
            e.begin(), e.end(), v, [](const item& x, std::size_t w) { return x.variable < w; });
        return it != e.end() && it->variable == v ? it->exponent : rational(0);
    };
    const auto keeps_dependent = [&](const std::vector<item>& e, bool dependent_group) {
        return std::all_of(dependents.begin(), dependents.end(), [&](std::size_t v) {
            return dependent_group ? exponent_in(e, v) == rational(1) : exponent_in(e, v).is_zero();
        });
    };
    std::vector<std::vector<item>> sparse(n);
    for (std::size_t g = 0; g < n; ++g)
        for (std::size_t v = 0; v < variables.size(); ++v)
            if (!groups[g].exponents[v].is_zero())
                sparse[g].push_back({v, groups[g].exponents[v]});

    std::vector<bool> replaced(n, false);
    std::vector<std::string> basis;
    for (const pi_group& g : groups)
        basis.push_back(g.formula);
    std::size_t pairs_tried = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const std::vector<item>& own = sparse[i];
        const bool whole = std::all_of(own.begin(), own.end(),
                                       [](const item& x) { return x.exponent.is_integer(); });
        const quality now = quality_of(candidates_for_items(variables, own), false);
        if (now.tier == 0)
            continue; // already a named number, or a power of one: the basis stands
        // Every pair of groups is a search of its own, so a study of hundreds of groups would
        // take minutes; past the budget the rest keep the form elimination gave them, and the
        // output says so.
        if (pairs_tried + n > max_pairs) {
            const std::string searched =
                i == 0 ? std::string("for none of them") : fmt::format("for π1 to π{} only", i);
            analysis.notes.push_back(fmt::format(
                "named numbers were sought among combinations of two groups {}: with {} groups, "
                "trying every pair would take too long (the search stops after {} pairs, which "
                "covers every pair of a study of up to {} groups); π{} to π{} are named only "
                "as elimination gave them, so a named number that a combination of them would "
                "make may be missing",
                searched, n, max_pairs, named_in_full(max_pairs), i + 1, n));
            break;
        }
        pairs_tried += n;

        std::optional<recombination> best;
        std::vector<item> e;
        const auto consider = [&](std::vector<std::pair<std::size_t, rational>> terms) {
            if (!keeps_dependent(e, groups[i].has_dependent))
                return;
            const bool fractional = whole && !std::all_of(e.begin(), e.end(), [](const item& x) {
                                        return x.exponent.is_integer();
                                    });
            const quality q = quality_of(candidates_for_items(variables, e), fractional);
            if (q.tier == 2 || !(q < (best ? best->q : now)))
                return;
            std::vector<rational> dense(variables.size());
            for (const item& x : e)
                dense[x.variable] = x.exponent;
            best = recombination{std::move(dense), std::move(terms), q};
        };
        try {
            // A new group involving group i keeps the set independent; a partner that was
            // itself replaced would make the basis terms of the text wrong, so only untouched
            // groups are partners.
            for (const auto& [an, ad] : powers) {
                const rational a(an, ad);
                if (groups[i].has_dependent && a != rational(1))
                    continue;
                if (a != rational(1)) {
                    e.clear();
                    for (const item& x : own)
                        e.push_back({x.variable, x.exponent * a});
                    consider({{i, a}});
                }
                for (std::size_t j = 0; j < n; ++j) {
                    if (j == i || replaced[j] || groups[j].has_dependent)
                        continue;
                    const std::vector<item>& other = sparse[j];
                    for (const auto& [bn, bd] : powers) {
                        const rational b(bn, bd);
                        // own·a + other·b over the union of their variables, in order.
                        e.clear();
                        std::size_t x = 0;
                        std::size_t y = 0;
                        while (x < own.size() || y < other.size()) {
                            const std::size_t v =
                                y == other.size() ||
                                        (x < own.size() && own[x].variable < other[y].variable)
                                    ? own[x].variable
                                    : other[y].variable;
                            rational sum = 0;
                            if (x < own.size() && own[x].variable == v)
                                sum += own[x++].exponent * a;
                            if (y < other.size() && other[y].variable == v)
                                sum += other[y++].exponent * b;
                            if (!sum.is_zero())
                                e.push_back({v, sum});
                        }
                        if (e.size() <= max_slots)
                            consider({{i, a}, {j, b}});
                    }
                }
            }
        } catch (const arithmetic_overflow&) {
            // Exponents this large name nothing; keep what was found so far.
        }
        if (!best)
            continue;
        groups[i].exponents = std::move(best->exponents);
        groups[i].formula = group_formula(variables, groups[i].exponents);
        groups[i].recombined_from = recombination_text(std::move(best->terms), basis);
        replaced[i] = true;
    }

    for (pi_group& g : groups)
        g.name = describe(candidates_for(variables, g.exponents), variables);
}

} // namespace plumb
