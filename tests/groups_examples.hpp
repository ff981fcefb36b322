// The variables of published dimensional-analysis examples, shared by the group tests and the
// cross-check against a general-purpose linear algebra library. The expected groups live with
// the tests; the sources are named both here and there.
#pragma once

#include "plumb/dimension.hpp"
#include "plumb/groups.hpp"
#include "plumb/rational.hpp"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace plumb::test {

// [M^m L^l T^t Θ^θ]: every example here lives in these four base dimensions.
inline dimension dim(rational m, rational l, rational t, rational theta = 0) {
    return dimension::from_exponents({m, l, t, theta, 0, 0, 0});
}

// Dimensions of the quantities, as ISO 80000-4 and -5 give them.
namespace dims {
inline const dimension force = dim(1, 1, -2);
inline const dimension density = dim(1, -3, 0);
inline const dimension speed = dim(0, 1, -1);
inline const dimension length = dim(0, 1, 0);
inline const dimension viscosity = dim(1, -1, -1);
inline const dimension kinematic_viscosity = dim(0, 2, -1);
inline const dimension pressure_gradient = dim(1, -2, -2);
inline const dimension pressure = dim(1, -1, -2);
inline const dimension time = dim(0, 0, 1);
inline const dimension frequency = dim(0, 0, -1);
inline const dimension acceleration = dim(0, 1, -2);
inline const dimension mass = dim(1, 0, 0);
inline const dimension volume_flow = dim(0, 3, -1);
inline const dimension surface_tension = dim(1, 0, -2);
inline const dimension specific_energy = dim(0, 2, -2); // g H, energy per unit mass
inline const dimension power = dim(1, 2, -3);
inline const dimension heat_transfer_coefficient = dim(1, 0, -3, -1);
inline const dimension specific_heat = dim(0, 2, -2, -1);
inline const dimension thermal_conductivity = dim(1, 1, -3, -1);
inline const dimension buoyancy = dim(0, 1, -2, -1); // g β
inline const dimension temperature_difference = dim(0, 0, 0, 1);
inline const dimension diffusivity = dim(0, 2, -1);
} // namespace dims

struct worked_example {
    std::string name;
    std::vector<group_variable> variables;
    std::optional<std::size_t> dependent;

    [[nodiscard]] group_request request() const {
        return {variables,
                dependent ? std::vector<std::size_t>{*dependent} : std::vector<std::size_t>{},
                {}};
    }
};

// F. M. White, Fluid Mechanics, 7th ed., §5.1: the drag of a sphere, F = f(D, V, ρ, μ).
inline worked_example sphere_drag() {
    return {"drag on a sphere",
            {{"F", dims::force},
             {"ρ", dims::density},
             {"V", dims::speed},
             {"D", dims::length},
             {"μ", dims::viscosity}},
            0};
}

// Munson et al., Fundamentals of Fluid Mechanics, §7.3 (from memory): the pressure drop per
// unit length of a smooth pipe, Δp_ℓ = f(D, ρ, μ, V).
inline worked_example smooth_pipe() {
    return {"pressure drop in a smooth pipe",
            {{"Δp_ℓ", dims::pressure_gradient},
             {"D", dims::length},
             {"ρ", dims::density},
             {"μ", dims::viscosity},
             {"V", dims::speed}},
            0};
}

// The same with the wall roughness ε (Munson et al., ch. 8, the Moody chart; from memory).
inline worked_example rough_pipe() {
    worked_example ex = smooth_pipe();
    ex.name = "pressure drop in a rough pipe";
    ex.variables.push_back({"ε", dims::length});
    return ex;
}

// Çengel & Cimbala, Fluid Mechanics, ch. 7 (the pendulum example; from memory): the period of
// a simple pendulum with the bob's mass listed although it cannot matter.
inline worked_example pendulum() {
    return {"simple pendulum",
            {{"T", dims::time}, {"L", dims::length}, {"g", dims::acceleration}, {"m", dims::mass}},
            0};
}

// Munson et al., ch. 7, the rectangular-weir example (from memory): Q = f(g, H, b).
inline worked_example weir() {
    return {"flow over a weir",
            {{"Q", dims::volume_flow},
             {"g", dims::acceleration},
             {"H", dims::length},
             {"b", dims::length}},
            0};
}

// White, 7th ed., ch. 10 (from memory): deep-water waves, c = f(g, λ).
inline worked_example deep_water_waves() {
    return {"deep-water waves",
            {{"c", dims::speed}, {"g", dims::acceleration}, {"λ", dims::length}},
            0};
}

// White, 7th ed., ch. 10 (from memory): shallow-water waves, c = f(g, h).
inline worked_example shallow_water_waves() {
    return {"shallow-water waves",
            {{"c", dims::speed}, {"g", dims::acceleration}, {"h", dims::length}},
            0};
}

// A drop formed from a jet, inviscid: d = f(D, ρ, V, σ); the Weber number as White, 7th ed.,
// Table 5.2 defines it (from memory).
inline worked_example droplet() {
    return {"drop from a jet",
            {{"d", dims::length},
             {"D", dims::length},
             {"ρ", dims::density},
             {"V", dims::speed},
             {"σ", dims::surface_tension}},
            0};
}

// White, 7th ed., §11.4 (from memory): pump similarity, g H = f(Q, N, D, ρ, μ) and the power.
inline worked_example pump() {
    return {"pump scaling",
            {{"Q", dims::volume_flow},
             {"N", dims::frequency},
             {"D", dims::length},
             {"gH", dims::specific_energy},
             {"P", dims::power},
             {"ρ", dims::density},
             {"μ", dims::viscosity}},
            3};
}

// Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 7, the cylinder in cross flow
// (from memory): h = f(D, V, ρ, μ, c_p, k), Nu_D = f(Re_D, Pr).
inline worked_example cylinder_crossflow() {
    return {"heat transfer from a cylinder in cross flow",
            {{"h", dims::heat_transfer_coefficient},
             {"D", dims::length},
             {"V", dims::speed},
             {"ρ", dims::density},
             {"μ", dims::viscosity},
             {"c_p", dims::specific_heat},
             {"k", dims::thermal_conductivity}},
            0};
}

// Incropera et al., ch. 9, free convection (from memory): h = f(L, gβ, ΔT, ν, α, k),
// Nu_L = f(Gr_L, Pr).
inline worked_example natural_convection() {
    return {"natural convection from a plate",
            {{"h", dims::heat_transfer_coefficient},
             {"L", dims::length},
             {"gβ", dims::buoyancy},
             {"ΔT", dims::temperature_difference},
             {"ν", dims::kinematic_viscosity},
             {"α", dims::diffusivity},
             {"k", dims::thermal_conductivity}},
            0};
}

// White, 7th ed., ch. 5, Table 5.2, the Strouhal number (from memory): the shedding frequency
// behind a cylinder, f = f(V, D, ρ, μ).
inline worked_example vortex_shedding() {
    return {"vortex shedding",
            {{"f", dims::frequency},
             {"V", dims::speed},
             {"D", dims::length},
             {"ρ", dims::density},
             {"μ", dims::viscosity}},
            0};
}

// Çengel & Cimbala, ch. 7, the soap-bubble example (Example 7-7, from memory): Δp = f(R, σ).
// Mass and time only ever appear together as M T^-2, so the rank is 2 although three base
// dimensions occur.
inline worked_example soap_bubble() {
    return {"pressure in a soap bubble",
            {{"Δp", dims::pressure}, {"R", dims::length}, {"σ", dims::surface_tension}},
            0};
}

inline std::vector<worked_example> all_worked_examples() {
    return {sphere_drag(), smooth_pipe(),        rough_pipe(),          pendulum(),
            weir(),        deep_water_waves(),   shallow_water_waves(), droplet(),
            pump(),        cylinder_crossflow(), natural_convection(),  vortex_shedding(),
            soap_bubble()};
}

} // namespace plumb::test
