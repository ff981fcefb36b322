// Named characteristic numbers: each recognised from its defining variables, to a power, with
// ambiguous readings listed; and the recombination of a basis into named numbers. Groups are
// typed by hand, every expected exponent worked out by hand; the source of each definition is
// named beside it ("from memory" where the item number was recalled, not checked).
#include "plumb/dimension.hpp"
#include "plumb/groups.hpp"
#include "plumb/rational.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <initializer_list>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

using plumb::dimension;
using plumb::group_analysis;
using plumb::group_variable;
using plumb::named_group_match;
using plumb::pi_group;
using plumb::rational;

namespace {

using plumb::test::typed;

// Dimensions from the coherent SI unit of each quantity.
const dimension length = typed(0, 1, 0);             // m
const dimension area = typed(0, 2, 0);               // m²
const dimension time_ = typed(0, 0, 1);              // s
const dimension frequency = typed(0, 0, -1);         // Hz, rev/s, rad/s
const dimension speed = typed(0, 1, -1);             // m/s
const dimension acceleration = typed(0, 1, -2);      // m/s²
const dimension flow_rate = typed(0, 3, -1);         // m³/s
const dimension diffusivity = typed(0, 2, -1);       // m²/s
const dimension density = typed(1, -3, 0);           // kg/m³
const dimension viscosity = typed(1, -1, -1);        // Pa·s = kg/(m·s)
const dimension pressure = typed(1, -1, -2);         // Pa = kg/(m·s²)
const dimension surface_tension = typed(1, 0, -2);   // N/m = kg/s²
const dimension force = typed(1, 1, -2);             // N = kg·m/s²
const dimension power = typed(1, 2, -3);             // W = kg·m²/s³
const dimension specific_energy = typed(0, 2, -2);   // J/kg = m²/s²
const dimension temperature = typed(0, 0, 0, 1);     // K
const dimension expansion = typed(0, 0, 0, -1);      // 1/K
const dimension buoyancy = typed(0, 1, -2, -1);      // gβ: (m/s²)·(1/K) = m/(s²·K)
const dimension heat_transfer = typed(1, 0, -3, -1); // W/(m²·K) = kg/(s³·K)
const dimension conductivity = typed(1, 1, -3, -1);  // W/(m·K) = kg·m/(s³·K)
const dimension specific_heat = typed(0, 2, -2, -1); // J/(kg·K) = m²/(s²·K)
const dimension one{};                               // dimensionless

struct factor {
    std::string name;
    dimension dim;
    rational exponent;
};

struct group {
    std::vector<group_variable> variables;
    std::vector<rational> exponents;
};

group group_of(const std::vector<factor>& factors) {
    group g;
    for (const factor& f : factors) {
        g.variables.push_back({f.name, f.dim});
        g.exponents.push_back(f.exponent);
    }
    return g;
}

std::vector<rational> raised(const std::vector<rational>& e, rational p) {
    std::vector<rational> out;
    for (const rational x : e)
        out.push_back(x * p);
    return out;
}

bool has(const std::vector<named_group_match>& matches, std::string_view name, rational power) {
    for (const named_group_match& m : matches)
        if (m.name == name && m.power == power)
            return true;
    return false;
}

std::string listing(const std::vector<named_group_match>& matches) {
    std::string out;
    for (const named_group_match& m : matches)
        out += std::string(m.name) + " ^" + m.power.to_string() + "; ";
    return out.empty() ? std::string("(nothing)") : out;
}

std::vector<named_group_match> recognise(const group& g) {
    return plumb::recognise_group(g.variables, g.exponents);
}

std::vector<named_group_match> recognise(const group& g, const std::vector<rational>& e) {
    return plumb::recognise_group(g.variables, e);
}

// The text name_groups gives one group standing alone.
std::string name_of(const group& g) {
    group_analysis a;
    pi_group p;
    p.exponents = g.exponents;
    a.groups.push_back(p);
    plumb::name_groups(a, g.variables);
    return a.groups.front().name;
}

pi_group basis_group(std::vector<rational> exponents, std::string formula,
                     bool has_dependent = false) {
    pi_group p;
    p.exponents = std::move(exponents);
    p.formula = std::move(formula);
    p.has_dependent = has_dependent;
    return p;
}

std::vector<rational> whole(std::initializer_list<std::int64_t> values) {
    std::vector<rational> out;
    for (const std::int64_t v : values)
        out.emplace_back(v);
    return out;
}

const rational half(1, 2);

struct named_case {
    const char* number;
    const char* source;
    std::vector<factor> factors;
};

} // namespace

TEST_CASE("named numbers are recognised from their defining variables, inverted and squared") {
    const named_case cases[] = {
        {"Reynolds number",
         "ISO 80000-11:2019, item 11-4.1 (Reynolds): Re = ρvl/η",
         {{"ρ", density, 1}, {"V", speed, 1}, {"D", length, 1}, {"μ", viscosity, -1}}},
        {"Reynolds number",
         "ISO 80000-11:2019, item 11-4.1 (Reynolds): Re = vl/ν",
         {{"V", speed, 1}, {"D", length, 1}, {"ν", diffusivity, -1}}},
        {"Reynolds number",
         "common practice for pumps and fans (White, Fluid Mechanics, 7th ed., ch. 11, from "
         "memory): the rotational Re = ρND²/μ",
         {{"ρ", density, 1}, {"N", frequency, 1}, {"D", length, 2}, {"μ", viscosity, -1}}},
        {"Reynolds number",
         "the same with ν = μ/ρ: Re = ND²/ν",
         {{"N", frequency, 1}, {"D", length, 2}, {"ν", diffusivity, -1}}},
        {"Euler number",
         "ISO 80000-11:2019, item 11-4.2, from memory (Euler): Eu = Δp/(ρv²)",
         {{"Δp", pressure, 1}, {"ρ", density, -1}, {"V", speed, -2}}},
        {"pressure coefficient",
         "common practice: C_p = (p - p∞)/(½ρv²), the ½ not being part of a group",
         {{"Δp", pressure, 1}, {"ρ", density, -1}, {"V", speed, -2}}},
        {"Froude number",
         "ISO 80000-11:2019, item 11-4.3, from memory (Froude): Fr = v/√(lg)",
         {{"V", speed, 1}, {"g", acceleration, -half}, {"L", length, -half}}},
        {"Weber number",
         "ISO 80000-11:2019, item 11-4.5, from memory (Weber): We = ρv²l/γ",
         {{"ρ", density, 1}, {"V", speed, 2}, {"L", length, 1}, {"σ", surface_tension, -1}}},
        {"Mach number",
         "ISO 80000-11:2019, item 11-4.6, from memory (Mach): Ma = v/c",
         {{"V", speed, 1}, {"c", speed, -1}}},
        {"Strouhal number",
         "ISO 80000-11:2019, item 11-4.8, from memory (Strouhal): Sr = lf/v",
         {{"L", length, 1}, {"f", frequency, 1}, {"V", speed, -1}}},
        {"Knudsen number",
         "ISO 80000-11:2019, item 11-4.7, from memory (Knudsen): Kn = λ/l, λ mean free path",
         {{"λ", length, 1}, {"L", length, -1}}},
        {"relative roughness",
         "common practice (Moody chart): ε/D",
         {{"ε", length, 1}, {"D", length, -1}}},
        {"capillary number",
         "ISO 80000-11:2019, clause 4, item number from memory (capillary): Ca = ηv/γ",
         {{"μ", viscosity, 1}, {"V", speed, 1}, {"σ", surface_tension, -1}}},
        {"Bond (Eötvös) number",
         "ISO 80000-11:2019, clause 4, item number from memory (Eötvös): Eo = Δρgl²/γ",
         {{"Δρ", density, 1},
          {"g", acceleration, 1},
          {"L", length, 2},
          {"σ", surface_tension, -1}}},
        {"Cauchy number",
         "ISO 80000-11:2019, clause 4, item number from memory (Cauchy): Cy = ρv²/K",
         {{"ρ", density, 1}, {"V", speed, 2}, {"K", pressure, -1}}},
        {"Galilei number",
         "common practice: Ga = gl³/ν²",
         {{"g", acceleration, 1}, {"L", length, 3}, {"ν", diffusivity, -2}}},
        {"Archimedes number",
         "common practice: Ar = gl³Δρ/(ρν²)",
         {{"g", acceleration, 1},
          {"L", length, 3},
          {"Δρ", density, 1},
          {"ρ", density, -1},
          {"ν", diffusivity, -2}}},
        {"Grashof number",
         "ISO 80000-11:2019, item 11-4.4, from memory (Grashof): Gr = l³gα_VΔT/ν²",
         {{"g", acceleration, 1},
          {"β", expansion, 1},
          {"ΔT", temperature, 1},
          {"L", length, 3},
          {"ν", diffusivity, -2}}},
        {"Grashof number",
         "the same with ν = η/ρ: Gr = l³gα_VΔTρ²/η²",
         {{"g", acceleration, 1},
          {"β", expansion, 1},
          {"ΔT", temperature, 1},
          {"L", length, 3},
          {"ρ", density, 2},
          {"μ", viscosity, -2}}},
        {"Grashof number",
         "the same with gβ as one variable (Boussinesq): Gr = gβ·ΔT·l³/ν²",
         {{"gβ", buoyancy, 1}, {"ΔT", temperature, 1}, {"L", length, 3}, {"ν", diffusivity, -2}}},
        {"Grashof number",
         "gβ as one variable and ν = μ/ρ: Gr = gβ·ΔT·l³ρ²/μ²",
         {{"gβ", buoyancy, 1},
          {"ΔT", temperature, 1},
          {"L", length, 3},
          {"ρ", density, 2},
          {"μ", viscosity, -2}}},
        {"Rayleigh number",
         "ISO 80000-11:2019, item 11-5.3, from memory (Rayleigh): Ra = l³gα_VΔT/(νa)",
         {{"g", acceleration, 1},
          {"β", expansion, 1},
          {"ΔT", temperature, 1},
          {"L", length, 3},
          {"ν", diffusivity, -1},
          {"α", diffusivity, -1}}},
        {"Rayleigh number",
         "the same with gβ as one variable: Ra = gβ·ΔT·l³/(νa)",
         {{"gβ", buoyancy, 1},
          {"ΔT", temperature, 1},
          {"L", length, 3},
          {"ν", diffusivity, -1},
          {"α", diffusivity, -1}}},
        {"Fourier number",
         "ISO 80000-11:2019, item 11-5.1, from memory (Fourier): Fo = at/l²",
         {{"α", diffusivity, 1}, {"t", time_, 1}, {"L", length, -2}}},
        {"Péclet number",
         "ISO 80000-11:2019, item 11-5.2, from memory (Péclet): Pe = vl/a",
         {{"V", speed, 1}, {"L", length, 1}, {"α", diffusivity, -1}}},
        {"Péclet number",
         "the same with a = λ/(ρc_p): Pe = vlρc_p/λ",
         {{"V", speed, 1},
          {"L", length, 1},
          {"ρ", density, 1},
          {"c_p", specific_heat, 1},
          {"k", conductivity, -1}}},
        {"Nusselt number",
         "ISO 80000-11:2019, item 11-5.4, from memory (Nusselt): Nu = Kl/λ, λ of the fluid",
         {{"h", heat_transfer, 1}, {"L", length, 1}, {"k_f", conductivity, -1}}},
        {"Biot number",
         "ISO 80000-11:2019, clause 5, item number from memory (Biot): Bi = Kl/λ_b, of the body",
         {{"h", heat_transfer, 1}, {"L", length, 1}, {"k_s", conductivity, -1}}},
        {"Stanton number",
         "ISO 80000-11:2019, clause 5, item number from memory (Stanton): St = K/(ρvc_p)",
         {{"h", heat_transfer, 1},
          {"ρ", density, -1},
          {"V", speed, -1},
          {"c_p", specific_heat, -1}}},
        {"Sherwood number",
         "ISO 80000-11:2019, clause 6, item number from memory (Sherwood): Sh = kl/D",
         {{"k_c", speed, 1}, {"L", length, 1}, {"D_AB", diffusivity, -1}}},
        {"Prandtl number",
         "ISO 80000-11:2019, item 11-7.1, from memory (Prandtl): Pr = ν/a",
         {{"ν", diffusivity, 1}, {"α", diffusivity, -1}}},
        {"Prandtl number",
         "ISO 80000-11:2019, item 11-7.1, from memory (Prandtl), as ηc_p/λ",
         {{"μ", viscosity, 1}, {"c_p", specific_heat, 1}, {"k", conductivity, -1}}},
        {"Schmidt number",
         "ISO 80000-11:2019, item 11-7.2, from memory (Schmidt): Sc = ν/D",
         {{"ν", diffusivity, 1}, {"D_AB", diffusivity, -1}}},
        {"Lewis number",
         "ISO 80000-11:2019, item 11-7.3, from memory (Lewis): Le = a/D",
         {{"α", diffusivity, 1}, {"D_AB", diffusivity, -1}}},
        {"drag coefficient",
         "common practice: C_D = F_D/(½ρv²A)",
         {{"F_D", force, 1}, {"ρ", density, -1}, {"V", speed, -2}, {"A", area, -1}}},
        {"drag coefficient",
         "common practice: the area given as a diameter squared",
         {{"F_D", force, 1}, {"ρ", density, -1}, {"V", speed, -2}, {"D", length, -2}}},
        {"lift coefficient",
         "common practice: C_L = F_L/(½ρv²A)",
         {{"F_L", force, 1}, {"ρ", density, -1}, {"V", speed, -2}, {"A", area, -1}}},
        {"flow coefficient",
         "common practice for pumps and fans: Q/(ND³)",
         {{"Q", flow_rate, 1}, {"N", frequency, -1}, {"D", length, -3}}},
        {"head coefficient",
         "common practice for pumps and fans: gH/(N²D²)",
         {{"g", acceleration, 1}, {"H", length, 1}, {"N", frequency, -2}, {"D", length, -2}}},
        {"head coefficient",
         "common practice: the same with gH as one variable",
         {{"gH", specific_energy, 1}, {"N", frequency, -2}, {"D", length, -2}}},
        {"head coefficient",
         "common practice for fans: Δp/(ρN²D²), the pressure rise for ρgH",
         {{"Δp", pressure, 1}, {"ρ", density, -1}, {"N", frequency, -2}, {"D", length, -2}}},
        {"power number",
         "common practice for pumps and fans: P/(ρN³D⁵)",
         {{"P", power, 1}, {"ρ", density, -1}, {"N", frequency, -3}, {"D", length, -5}}},
        {"discharge coefficient",
         "common practice for weirs and spillways: Q/√(gH⁵), the V-notch weir's C_d but for "
         "constants (Munson et al., 6th ed., Sec. 10.6, from memory)",
         {{"Q", flow_rate, 1}, {"g", acceleration, -half}, {"H", length, -rational(5, 2)}}},
    };
    for (const named_case& c : cases) {
        INFO(c.number);
        INFO(c.source);
        const group g = group_of(c.factors);
        const auto plain = recognise(g);
        INFO("as defined: ", listing(plain));
        CHECK(has(plain, c.number, 1));
        const auto inverse = recognise(g, raised(g.exponents, -1));
        INFO("inverted: ", listing(inverse));
        CHECK(has(inverse, c.number, -1));
        const auto square = recognise(g, raised(g.exponents, 2));
        INFO("squared: ", listing(square));
        CHECK(has(square, c.number, 2));
    }
}

TEST_CASE("Froude's two published forms are the number and its square") {
    // ISO 80000-11:2019, item 11-4.3 (from memory): Fr = v/√(lg); many texts write v²/(gl).
    const group g = group_of({{"V", speed, 2}, {"g", acceleration, -1}, {"L", length, -1}});
    const auto matches = recognise(g);
    INFO(listing(matches));
    REQUIRE(matches.size() == 1);
    CHECK(matches.front().name == "Froude number");
    CHECK(matches.front().power == rational(2));
    CHECK(name_of(g) == "square of the Froude number");
}

TEST_CASE("a ratio of two lengths is the same reading either way round") {
    // L/D and D/L are both plainly a ratio of two lengths; only roughness and a mean free path
    // have a direction, and only their names can say which length is which.
    const group g = group_of({{"L", length, 1}, {"D", length, -1}});
    const auto matches = recognise(g);
    INFO(listing(matches));
    REQUIRE(matches.size() == 1);
    CHECK(matches.front().name == "ratio of two lengths");
    CHECK(matches.front().power == rational(1));
    const auto swapped = recognise(g, raised(g.exponents, -1));
    REQUIRE(swapped.size() == 1);
    CHECK(swapped.front().power == rational(1));
    CHECK(name_of(g) == "ratio of two lengths");

    // ε/D (common practice, Moody chart): the name ε says roughness; dimension says ratio.
    const group rough = group_of({{"ε", length, 1}, {"D", length, -1}});
    const auto r = recognise(rough);
    INFO(listing(r));
    REQUIRE(r.size() == 2);
    CHECK(r[0].name == "relative roughness");
    CHECK(r[1].name == "ratio of two lengths");
    CHECK(name_of(rough) == "relative roughness (a ratio of two lengths)");

    // Knudsen (ISO 80000-11:2019, item 11-4.7, from memory): λ the mean free path.
    const group kn = group_of({{"λ", length, 1}, {"L", length, -1}});
    CHECK(name_of(kn) == "Knudsen number (a ratio of two lengths)");
}

TEST_CASE("ratios of two diffusivities are ambiguous by dimension") {
    // Pr = ν/a, Sc = ν/D, Le = a/D (ISO 80000-11:2019, items 11-7.1 to 11-7.3, from memory):
    // by dimension alone each is m²/s over m²/s.
    SUBCASE("names that say nothing: every candidate, plainly") {
        const group g = group_of({{"X", diffusivity, 1}, {"Y", diffusivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 3);
        CHECK(matches[0].name == "Prandtl number");
        CHECK(matches[1].name == "Schmidt number");
        CHECK(matches[2].name == "Lewis number");
        for (const auto& m : matches)
            CHECK(m.power == rational(1));
        CHECK(name_of(g) == "Prandtl, Schmidt or Lewis number (a ratio of two diffusivities)");
    }
    SUBCASE("ν over α: Prandtl first, the others still listed") {
        const group g = group_of({{"ν", diffusivity, 1}, {"α", diffusivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 3);
        CHECK(matches[0].name == "Prandtl number");
        CHECK(matches[0].power == rational(1));
        CHECK(has(matches, "Schmidt number", 1));
        // Read with α as the thermal diffusivity, ν/α would be D/a, the Lewis number inverted.
        CHECK(has(matches, "Lewis number", -1));
        CHECK(name_of(g) == "Prandtl number (a ratio of two diffusivities)");
    }
    SUBCASE("ν over D_AB: Schmidt first") {
        const group g = group_of({{"ν", diffusivity, 1}, {"D_AB", diffusivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 3);
        CHECK(matches[0].name == "Schmidt number");
        CHECK(matches[0].power == rational(1));
        CHECK(name_of(g) == "Schmidt number (a ratio of two diffusivities)");
    }
    SUBCASE("η over ρ times a diffusivity: Prandtl or Schmidt") {
        // Pr = η/(ρa), Sc = η/(ρD), ISO 80000-11:2019, items 11-7.1 and 11-7.2, from memory.
        const group g = group_of({{"μ", viscosity, 1}, {"ρ", density, -1}, {"X", diffusivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 2);
        CHECK(has(matches, "Prandtl number", 1));
        CHECK(has(matches, "Schmidt number", 1));
        CHECK(name_of(g) == "Prandtl or Schmidt number (a ratio of two diffusivities, one as η/ρ)");
    }
}

TEST_CASE("other readings that dimension alone cannot tell apart") {
    SUBCASE("a speed times a length over a diffusivity: Reynolds, Péclet or Sherwood") {
        // Re = vl/ν, Pe = vl/a, Sh = kl/D (ISO 80000-11:2019, items 11-4.1, 11-5.2 and
        // clause 6, the last two from memory); k, the mass transfer coefficient, is a speed.
        const group g = group_of({{"U", speed, 1}, {"L", length, 1}, {"X", diffusivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 3);
        CHECK(matches[0].name == "Reynolds number");
        CHECK(matches[1].name == "Péclet number");
        CHECK(matches[2].name == "Sherwood number");
        CHECK(name_of(g) ==
              "Reynolds, Péclet or Sherwood number (a speed times a length over a diffusivity)");
        const group with_nu = group_of({{"U", speed, 1}, {"L", length, 1}, {"ν", diffusivity, -1}});
        CHECK(name_of(with_nu) == "Reynolds number (a speed times a length over a diffusivity)");
    }
    SUBCASE("Nusselt or Biot: whose conductivity") {
        // Nu = Kl/λ of the fluid, Bi = Kl/λ_b of the body (ISO 80000-11:2019, item 11-5.4 and
        // clause 5, from memory).
        const group g =
            group_of({{"h", heat_transfer, 1}, {"L", length, 1}, {"k", conductivity, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 2);
        CHECK(name_of(g) == "Nusselt or Biot number (a heat transfer coefficient times a length "
                            "over a thermal conductivity)");
        const group solid =
            group_of({{"h", heat_transfer, 1}, {"L", length, 1}, {"k_s", conductivity, -1}});
        const auto s = recognise(solid);
        REQUIRE(s.size() == 2);
        CHECK(s[0].name == "Biot number");
        CHECK(s[1].name == "Nusselt number");
    }
    SUBCASE("drag or lift coefficient") {
        // Common practice: C_D and C_L share the group F/(ρv²A).
        const group g =
            group_of({{"F", force, 1}, {"ρ", density, -1}, {"V", speed, -2}, {"A", area, -1}});
        CHECK(name_of(g) == "drag or lift coefficient (a force over ρv² times an area)");
        const group with_d =
            group_of({{"F_D", force, 1}, {"ρ", density, -1}, {"V", speed, -2}, {"D", length, -2}});
        const auto matches = recognise(with_d);
        INFO(listing(matches));
        REQUIRE(matches.size() == 2);
        CHECK(matches[0].name == "drag coefficient");
        CHECK(name_of(with_d) == "drag coefficient (area taken as D²)");
    }
    SUBCASE("Euler number, pressure coefficient and the inverse of the Cauchy number") {
        // Eu = Δp/(ρv²) (item 11-4.2, from memory) and Cy = ρv²/K (clause 4, from memory) are
        // inverse groups by dimension.
        const group eu = group_of({{"Δp", pressure, 1}, {"ρ", density, -1}, {"V", speed, -2}});
        const auto e = recognise(eu);
        INFO(listing(e));
        REQUIRE(e.size() == 3);
        CHECK(e[0].name == "Euler number");
        CHECK(e[1].name == "pressure coefficient");
        CHECK(has(e, "Cauchy number", -1));
        CHECK(name_of(eu) == "Euler number or pressure coefficient (a pressure over ρv²)");

        const group neutral = group_of({{"ρ", density, 1}, {"V", speed, 2}, {"X", pressure, -1}});
        CHECK(name_of(neutral) == "Cauchy number (ρv² over a pressure or modulus; by dimension "
                                  "also the inverse of the Euler number or pressure coefficient)");
    }
    SUBCASE("a ratio of two speeds is read as a Mach number") {
        // ISO 80000-11:2019, item 11-4.6 (from memory): Ma = v/c.
        const group g = group_of({{"V", speed, 1}, {"U", speed, -1}});
        CHECK(name_of(g) == "Mach number (a ratio of two speeds)");
        const group with_c = group_of({{"V", speed, 1}, {"c", speed, -1}});
        CHECK(name_of(with_c) == "Mach number");
        const auto inverse = recognise(with_c, raised(with_c.exponents, -1));
        REQUIRE(inverse.size() == 1);
        CHECK(inverse.front().power == rational(-1));
    }
}

TEST_CASE("groups that are no named number stay unnamed") {
    SUBCASE("dimensionless but made up") {
        // F/(μVD): kg·m/s² over (kg/(m·s))·(m/s)·m = kg·m/s², dimensionless, no table entry.
        const group g =
            group_of({{"F", force, 1}, {"μ", viscosity, -1}, {"V", speed, -1}, {"D", length, -1}});
        CHECK(recognise(g).empty());
        CHECK(name_of(g).empty());
    }
    SUBCASE("a named number times a length ratio") {
        // ρVD²/(μL) = Re·D/L: five factors, and no number is defined by five like these.
        const group g = group_of({{"ρ", density, 1},
                                  {"V", speed, 1},
                                  {"D", length, 2},
                                  {"μ", viscosity, -1},
                                  {"L", length, -1}});
        CHECK(recognise(g).empty());
    }
    SUBCASE("a thermal strain and a dimensionless variable") {
        const group strain = group_of({{"β", expansion, 1}, {"ΔT", temperature, 1}});
        CHECK(recognise(strain).empty());
        const group angle = group_of({{"θ", one, 1}});
        CHECK(recognise(angle).empty());
    }
    SUBCASE("a power outside ±1, ±2, ±1/2") {
        // Re³ is dimensionally a Reynolds group, but nobody quotes it.
        const group g =
            group_of({{"ρ", density, 3}, {"V", speed, 3}, {"D", length, 3}, {"μ", viscosity, -3}});
        CHECK(recognise(g).empty());
    }
    SUBCASE("a name alone is no evidence") {
        // Variables called ν and α that are lengths make a length ratio, not a Prandtl number.
        const group g = group_of({{"ν", length, 1}, {"α", length, -1}});
        const auto matches = recognise(g);
        INFO(listing(matches));
        REQUIRE(matches.size() == 1);
        CHECK(matches.front().name == "ratio of two lengths");
        // And a group missing a factor is not dimensionless, so nothing at all.
        const group short_re = group_of({{"ρ", density, 1}, {"V", speed, 1}, {"μ", viscosity, -1}});
        CHECK(recognise(short_re).empty());
    }
}

TEST_CASE("an inverse Reynolds group in the basis becomes the Reynolds number") {
    // Pipe pressure drop: Δp = f(ρ, V, D, μ), repeating ρ, V, D. π1 = Δp/(ρV²),
    // π2 = μ/(ρVD), the inverse of Re (ISO 80000-11:2019, item 11-4.1).
    const std::vector<group_variable> vars = {
        {"Δp", pressure}, {"ρ", density}, {"V", speed}, {"D", length}, {"μ", viscosity}};
    group_analysis a;
    a.rank = 3;
    a.repeating = {1, 2, 3};
    a.groups.push_back(basis_group(whole({1, -1, -2, 0, 0}), "Δp/(ρ*V^2)", true));
    a.groups.push_back(basis_group(whole({0, -1, -1, -1, 1}), "μ/(ρ*V*D)"));
    plumb::name_groups(a, vars);

    REQUIRE(a.groups.size() == 2);
    CHECK(a.groups[0].exponents == whole({1, -1, -2, 0, 0}));
    CHECK(a.groups[0].recombined_from.empty());
    CHECK(a.groups[0].name == "Euler number or pressure coefficient (a pressure over ρv²)");

    // 1/π2 = ρVD/μ: exponents negated.
    CHECK(a.groups[1].exponents == whole({0, 1, 1, 1, -1}));
    CHECK(a.groups[1].name == "Reynolds number");
    CHECK(a.groups[1].recombined_from == "1/(μ/(ρ*V*D))");
    CHECK(a.groups[1].formula == plumb::group_formula(vars, whole({0, 1, 1, 1, -1})));
    CHECK(a.groups[1].formula == "ρ*V*D/μ");
    CHECK_FALSE(a.groups[1].has_dependent);
}

TEST_CASE("Grashof and Prandtl in the basis are left alone") {
    // Gr = gβΔTL³/ν², Pr = ν/α (ISO 80000-11:2019, items 11-4.4 and 11-7.1, from memory).
    // Their product is the Rayleigh number, but both are already named numbers.
    const std::vector<group_variable> vars = {{"g", acceleration}, {"β", expansion},
                                              {"ΔT", temperature}, {"L", length},
                                              {"ν", diffusivity},  {"α", diffusivity}};
    group_analysis a;
    a.groups.push_back(basis_group(whole({1, 1, 1, 3, -2, 0}), "g*β*ΔT*L^3/ν^2"));
    a.groups.push_back(basis_group(whole({0, 0, 0, 0, 1, -1}), "ν/α"));
    plumb::name_groups(a, vars);

    CHECK(a.groups[0].exponents == whole({1, 1, 1, 3, -2, 0}));
    CHECK(a.groups[0].name == "Grashof number");
    CHECK(a.groups[0].recombined_from.empty());
    CHECK(a.groups[0].formula == "g*β*ΔT*L^3/ν^2");
    CHECK(a.groups[1].exponents == whole({0, 0, 0, 0, 1, -1}));
    CHECK(a.groups[1].name == "Prandtl number (a ratio of two diffusivities)");
    CHECK(a.groups[1].recombined_from.empty());
}

TEST_CASE("Rayleigh from Grashof times Prandtl") {
    // Variables g, β, ΔT, L, ρ, μ, c_p, k. Gr = gβΔTL³ρ²/μ² and Pr = μc_p/k, so
    // Ra = Gr·Pr = gβΔTL³ρ²c_p/(μk) (ISO 80000-11:2019, item 11-5.3, from memory, with
    // ν = μ/ρ and a = k/(ρc_p)).
    const std::vector<group_variable> vars = {
        {"g", acceleration}, {"β", expansion}, {"ΔT", temperature},    {"L", length},
        {"ρ", density},      {"μ", viscosity}, {"c_p", specific_heat}, {"k", conductivity}};

    SUBCASE("written out, it is recognised directly") {
        group_analysis a;
        a.groups.push_back(basis_group(whole({1, 1, 1, 3, 2, -1, 1, -1}), "Ra"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].name == "Rayleigh number");
        CHECK(a.groups[0].recombined_from.empty());
        CHECK(a.groups[0].formula == "Ra"); // untouched: nothing was recombined
    }
    SUBCASE("an unnamed Gr·Pr² in the basis is recombined with Pr") {
        // π2 = Gr·Pr² = gβΔTL³ρ²c_p²/k²: M 2−2, L 1+3−6+4−2, T −2−4+6, Θ −1+1−2+2, all 0,
        // and no number is defined by those seven factors. π2/π1 = gβΔTL³ρ²c_p/(μk): the
        // μ exponent 0 − 1 = −1, c_p 2 − 1 = 1, k −2 + 1 = −1.
        group_analysis a;
        a.groups.push_back(basis_group(whole({0, 0, 0, 0, 0, 1, 1, -1}), "μ*c_p/k"));
        a.groups.push_back(basis_group(whole({1, 1, 1, 3, 2, 0, 2, -2}), "π2"));
        plumb::name_groups(a, vars);

        CHECK(a.groups[0].name == "Prandtl number");
        CHECK(a.groups[0].recombined_from.empty());
        CHECK(a.groups[1].exponents == whole({1, 1, 1, 3, 2, -1, 1, -1}));
        CHECK(a.groups[1].name == "Rayleigh number");
        CHECK(a.groups[1].recombined_from == "(π2)/(μ*c_p/k)");
        CHECK(a.groups[1].formula == "g*β*ΔT*L^3*ρ^2*c_p/(μ*k)");
    }
}

TEST_CASE("pump and fan groups are the flow, head and power coefficients") {
    SUBCASE("gH given as one variable") {
        // Common practice: Q/(ND³), gH/(N²D²), P/(ρN³D⁵), repeating ρ, N, D.
        const std::vector<group_variable> vars = {{"Q", flow_rate},        {"N", frequency},
                                                  {"D", length},           {"ρ", density},
                                                  {"gH", specific_energy}, {"P", power}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({1, -1, -3, 0, 0, 0}), "Q/(N*D^3)"));
        a.groups.push_back(basis_group(whole({0, -2, -2, 0, 1, 0}), "gH/(N^2*D^2)"));
        a.groups.push_back(basis_group(whole({0, -3, -5, -1, 0, 1}), "P/(N^3*D^5*ρ)", true));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].name == "flow coefficient");
        CHECK(a.groups[1].name == "head coefficient");
        CHECK(a.groups[2].name == "power number");
        for (const auto& g : a.groups)
            CHECK(g.recombined_from.empty());
    }
    SUBCASE("g and H separately: g/(N²D) times H/D is the head coefficient") {
        // The basis gives g/(N²D) and H/D; their product gH/(N²D²) has N −2, D −1 − 1 = −2.
        const std::vector<group_variable> vars = {
            {"Q", flow_rate},    {"N", frequency}, {"D", length}, {"ρ", density},
            {"g", acceleration}, {"H", length},    {"P", power}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({1, -1, -3, 0, 0, 0, 0}), "Q/(N*D^3)"));
        a.groups.push_back(basis_group(whole({0, -2, -1, 0, 1, 0, 0}), "g/(N^2*D)"));
        a.groups.push_back(basis_group(whole({0, 0, -1, 0, 0, 1, 0}), "H/D"));
        a.groups.push_back(basis_group(whole({0, -3, -5, -1, 0, 0, 1}), "P/(N^3*D^5*ρ)", true));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].name == "flow coefficient");
        CHECK(a.groups[1].exponents == whole({0, -2, -2, 0, 1, 1, 0}));
        CHECK(a.groups[1].name == "head coefficient");
        CHECK(a.groups[1].recombined_from == "(g/(N^2*D))·(H/D)");
        CHECK(a.groups[1].formula == "g*H/(N^2*D^2)");
        CHECK(a.groups[2].name == "ratio of two lengths");
        CHECK(a.groups[2].recombined_from.empty());
        CHECK(a.groups[3].name == "power number");
        CHECK(a.groups[3].exponents == whole({0, -3, -5, -1, 0, 0, 1}));
    }
}

TEST_CASE("recombination keeps the dependent variable to the first power in its own group") {
    // Viscometer: μ is the result, so μ/(ρVD) must keep μ to the first power and may not be
    // inverted; combining it with L/D only gives μ/(ρVL), still an inverse Reynolds number.
    const std::vector<group_variable> vars = {
        {"μ", viscosity}, {"ρ", density}, {"V", speed}, {"D", length}, {"L", length}};
    group_analysis a;
    a.groups.push_back(basis_group(whole({1, -1, -1, -1, 0}), "μ/(ρ*V*D)", true));
    a.groups.push_back(basis_group(whole({0, 0, 0, -1, 1}), "L/D"));
    plumb::name_groups(a, vars);
    CHECK(a.groups[0].exponents == whole({1, -1, -1, -1, 0}));
    CHECK(a.groups[0].name == "inverse of the Reynolds number");
    CHECK(a.groups[0].recombined_from.empty());
    CHECK(a.groups[0].formula == "μ/(ρ*V*D)");
    CHECK(a.groups[1].name == "ratio of two lengths");
}

TEST_CASE("inverted groups are turned the plain way round") {
    SUBCASE("gL/V² becomes the square of the Froude number, not √ of anything") {
        // Fr = v/√(lg) (item 11-4.3, from memory); gL/V² = Fr^-2. Inverting gives Fr², whole
        // exponents; the power −1/2 would give Fr itself but with half exponents.
        const std::vector<group_variable> vars = {{"V", speed}, {"g", acceleration}, {"L", length}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({-2, 1, 1}), "g*L/V^2"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].exponents == whole({2, -1, -1}));
        CHECK(a.groups[0].name == "square of the Froude number");
        CHECK(a.groups[0].recombined_from == "1/(g*L/V^2)");
        CHECK(a.groups[0].formula == "V^2/(g*L)");
    }
    SUBCASE("V²/(gL) already in the basis stays as it is") {
        const std::vector<group_variable> vars = {{"V", speed}, {"g", acceleration}, {"L", length}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({2, -1, -1}), "V^2/(g*L)"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].exponents == whole({2, -1, -1}));
        CHECK(a.groups[0].name == "square of the Froude number");
        CHECK(a.groups[0].recombined_from.empty());
    }
    SUBCASE("c/V becomes the Mach number V/c") {
        // Ma = v/c (item 11-4.6, from memory): c names the speed of sound.
        const std::vector<group_variable> vars = {{"c", speed}, {"V", speed}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({1, -1}), "c/V"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].exponents == whole({-1, 1}));
        CHECK(a.groups[0].name == "Mach number");
        CHECK(a.groups[0].recombined_from == "1/(c/V)");
        CHECK(a.groups[0].formula == "V/c");
    }
}

TEST_CASE("the rotational Reynolds number of pumps and fans") {
    // Common practice (F. M. White, Fluid Mechanics, 7th ed., ch. 11, from memory): with a
    // rotational speed N, ND stands for the speed: Re = ρND²/μ. Dimensions: kg/m³ · 1/s · m² over
    // kg/(m·s) = kg/(m·s) over kg/(m·s), dimensionless.
    const group re =
        group_of({{"ρ", density, 1}, {"n", frequency, 1}, {"D", length, 2}, {"μ", viscosity, -1}});
    const auto matches = recognise(re);
    INFO(listing(matches));
    REQUIRE(matches.size() == 1);
    CHECK(matches.front().name == "Reynolds number");
    CHECK(matches.front().power == rational(1));
    CHECK(name_of(re) == "Reynolds number (rotational, ρND²/μ)");

    // nD²/ν with a diffusivity the name does not call ν: what it is by dimension is said.
    const group with_x = group_of({{"n", frequency, 1}, {"D", length, 2}, {"X", diffusivity, -1}});
    CHECK(name_of(with_x) == "Reynolds number (rotational, ND²/ν; a rotational speed times a "
                             "length squared over a diffusivity)");

    // nD/ν is not dimensionless (1/s · m over m²/s leaves 1/m), so it is no number at all.
    const group short_d = group_of({{"n", frequency, 1}, {"D", length, 1}, {"ν", diffusivity, -1}});
    CHECK(recognise(short_d).empty());
}

TEST_CASE("the pump's inverse rotational Reynolds group becomes ρnD²/μ") {
    // Pump head, gH = f(ρ, n, D, Q, μ), repeating ρ, n, D (White, 7th ed., Sec. 11.4, from
    // memory): π1 = gH/(n²D²), π2 = Q/(nD³), π3 = μ/(ρnD²). 1/π3 = ρnD²/μ: exponents of
    // π3 (ρ −1, n −1, D −2, μ 1) negated.
    const std::vector<group_variable> vars = {{"gH", specific_energy}, {"ρ", density},
                                              {"n", frequency},        {"D", length},
                                              {"Q", flow_rate},        {"μ", viscosity}};
    group_analysis a;
    a.rank = 3;
    a.repeating = {1, 2, 3};
    a.groups.push_back(basis_group(whole({1, 0, -2, -2, 0, 0}), "gH/(n^2*D^2)", true));
    a.groups.push_back(basis_group(whole({0, 0, -1, -3, 1, 0}), "Q/(n*D^3)"));
    a.groups.push_back(basis_group(whole({0, -1, -1, -2, 0, 1}), "μ/(ρ*n*D^2)"));
    plumb::name_groups(a, vars);

    CHECK(a.groups[0].name == "head coefficient");
    CHECK(a.groups[0].recombined_from.empty());
    CHECK(a.groups[1].name == "flow coefficient");
    CHECK(a.groups[1].recombined_from.empty());
    CHECK(a.groups[2].exponents == whole({0, 1, 1, 2, 0, -1}));
    CHECK(a.groups[2].name == "Reynolds number (rotational, ρND²/μ)");
    CHECK(a.groups[2].recombined_from == "1/(μ/(ρ*n*D^2))");
    CHECK(a.groups[2].formula == "ρ*n*D^2/μ");
}

TEST_CASE("Grashof with gβ as one variable, and the Prandtl number beside it") {
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., ch. 9 (from memory):
    // Gr = gβ(T_s − T_∞)L³/ν². gβ in m/(s²·K), ΔT in K, L³ in m³, ν² in m⁴/s²: m⁴/s² over
    // m⁴/s², dimensionless. Variables h, k, gβ, ΔT, L, ν, α as the natural-convection study.
    const std::vector<group_variable> vars = {
        {"h", heat_transfer}, {"k", conductivity}, {"gβ", buoyancy},  {"ΔT", temperature},
        {"L", length},        {"ν", diffusivity},  {"α", diffusivity}};
    group_analysis a;
    a.groups.push_back(basis_group(whole({1, -1, 0, 0, 1, 0, 0}), "h*L/k", true));
    a.groups.push_back(basis_group(whole({0, 0, 1, 1, 3, -2, 0}), "gβ*ΔT*L^3/ν^2"));
    a.groups.push_back(basis_group(whole({0, 0, 0, 0, 0, -1, 1}), "α/ν"));
    plumb::name_groups(a, vars);

    CHECK(a.groups[1].name == "Grashof number");
    CHECK(a.groups[1].recombined_from.empty()); // named already: not made a Rayleigh number
    CHECK(a.groups[1].formula == "gβ*ΔT*L^3/ν^2");
    // α/ν = 1/Pr (ISO 80000-11:2019, item 11-7.1, from memory) is turned round.
    CHECK(a.groups[2].exponents == whole({0, 0, 0, 0, 0, 1, -1}));
    CHECK(a.groups[2].name == "Prandtl number (a ratio of two diffusivities)");
    CHECK(a.groups[2].recombined_from == "1/(α/ν)");

    // gβ·ΔT·L³/(να) = Gr·Pr is the Rayleigh number (item 11-5.3, from memory).
    const group ra = group_of({{"gβ", buoyancy, 1},
                               {"ΔT", temperature, 1},
                               {"L", length, 3},
                               {"ν", diffusivity, -1},
                               {"α", diffusivity, -1}});
    CHECK(name_of(ra) == "Rayleigh number");
    // Without ΔT, gβL³/ν² keeps 1/K and is not dimensionless: nothing.
    const group no_dt = group_of({{"gβ", buoyancy, 1}, {"L", length, 3}, {"ν", diffusivity, -2}});
    CHECK(recognise(no_dt).empty());
}

TEST_CASE("the discharge group of weirs and spillways") {
    // Common practice (V-notch weir Q = (8/15)·C_d·√(2g)·tan(θ/2)·H^(5/2); Munson et al., 6th
    // ed., Sec. 10.6, from memory): Q/√(gH⁵). m³/s over √(m/s² · m⁵) = m³/s, dimensionless.
    SUBCASE("the weir: Q/(g^(1/2)·H^(5/2)) holds the dependent variable and stays as it is") {
        const std::vector<group_variable> vars = {
            {"Q", flow_rate}, {"g", acceleration}, {"H", length}, {"b", length}};
        group_analysis a;
        a.groups.push_back(basis_group({rational(1), -half, -rational(5, 2), rational(0)},
                                       "Q/(g^(1/2)*H^(5/2))", true));
        a.groups.push_back(basis_group(whole({0, 0, -1, 1}), "b/H"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].name == "discharge coefficient (Q/√(gH⁵))");
        CHECK(a.groups[0].recombined_from.empty());
        CHECK(a.groups[0].formula == "Q/(g^(1/2)*H^(5/2))");
        CHECK(a.groups[1].name == "ratio of two lengths");
    }
    SUBCASE("the spillway: Q²/(gP⁵) is its square, kept with whole exponents") {
        // (Q/(g^(1/2)P^(5/2)))² = Q²/(gP⁵); the square root would bring back halves.
        const std::vector<group_variable> vars = {
            {"Q", flow_rate}, {"g", acceleration}, {"P", length}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({2, -1, -5}), "Q^2/(g*P^5)"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].exponents == whole({2, -1, -5}));
        CHECK(a.groups[0].name == "square of the discharge coefficient (Q/√(gH⁵))");
        CHECK(a.groups[0].recombined_from.empty());
        const auto matches =
            recognise(group_of({{"Q", flow_rate, 2}, {"g", acceleration, -1}, {"P", length, -5}}));
        INFO(listing(matches));
        REQUIRE(matches.size() == 1);
        CHECK(matches.front().power == rational(2));
    }
    SUBCASE("gP⁵/Q² is turned round to the square") {
        const std::vector<group_variable> vars = {
            {"Q", flow_rate}, {"g", acceleration}, {"P", length}};
        group_analysis a;
        a.groups.push_back(basis_group(whole({-2, 1, 5}), "g*P^5/Q^2"));
        plumb::name_groups(a, vars);
        CHECK(a.groups[0].exponents == whole({2, -1, -5}));
        CHECK(a.groups[0].recombined_from == "1/(g*P^5/Q^2)");
        CHECK(a.groups[0].formula == "Q^2/(g*P^5)");
    }
}
