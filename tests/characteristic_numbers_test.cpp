// External checks: facts published outside this project, written as plumb text. Every
// characteristic number must come out dimensionless (its symbol is declared `: 1` and stands
// on the left, so a wrong dimension would be a side-mismatch), a few deliberately wrong
// variants must fail, and the SI's derived units must reduce to the base dimensions the SI
// Brochure gives. The source of each fact is named beside it.
#include "plumb/check.hpp"
#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"
#include "plumb/rules.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <chrono>
#include <cstdint>
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

namespace {

namespace fs = std::filesystem;
using plumb::dimension;
using plumb::rational;

std::string listing(const plumb::check_report& report) {
    std::string out;
    for (const auto& d : report.diagnostics) {
        if (d.where.file != nullptr) {
            const auto at = d.where.file->position(d.where.range.begin);
            out += std::to_string(at.line) + ":" + std::to_string(at.column) + ": ";
        }
        out += d.rule + ": " + d.message + "\n";
    }
    return out.empty() ? std::string("(no findings)") : out;
}

struct named_text {
    const char* name;
    const char* text;
};

// The text must check without any finding: the number is dimensionless and every declared
// quantity is used.
void holds(const named_text& c) {
    const auto report = plumb::check_text("numbers.plumb", c.text);
    INFO(c.name);
    INFO(c.text);
    INFO(listing(report));
    CHECK(report.diagnostics.empty());
    CHECK(report.formulas_checked >= 1);
}

// The text's last formula, on line `line`, must be reported as a side-mismatch, and nothing
// else may be reported.
void fails(const named_text& c, std::uint32_t line) {
    const auto report = plumb::check_text("numbers.plumb", c.text);
    INFO(c.name);
    INFO(c.text);
    INFO(listing(report));
    REQUIRE(report.diagnostics.size() == 1);
    const auto& d = report.diagnostics.front();
    CHECK(d.rule == plumb::rules::side_mismatch);
    CHECK(d.level == plumb::severity::error);
    REQUIRE(d.where.file != nullptr);
    CHECK(d.where.file->position(d.where.range.begin).line == line);
}

using plumb::test::typed;

using plumb::test::temp_dir;

void dimension_is(const std::string& expression, const fs::path& context,
                  const dimension& expected) {
    const auto q = plumb::query_dimension(expression, {context});
    INFO("expression: ", expression);
    INFO(listing(q.report));
    CHECK(q.dim.has_value());
    if (!q.dim)
        return;
    CHECK(q.dim->to_string() == expected.to_string());
    CHECK(*q.dim == expected);
}

} // namespace

TEST_CASE("characteristic numbers of ISO 80000-11 are dimensionless") {
    // Definitions as ISO 80000-11:2019 gives them; item numbers marked "from memory" were not
    // checked against the text. Quantities are declared by their coherent SI units.
    const named_text numbers[] = {
        // ISO 80000-11:2019, item 11-4.1: Re = ρ v l / η = v l / ν.
        {"Reynolds", "Re : 1\n\u03C1 : kg/m^3\nv : m/s\nl : m\n\u03B7 : Pa*s\n\u03BD : m^2/s\n"
                     "Re = \u03C1*v*l/\u03B7\n"
                     "Re = v*l/\u03BD\n"},
        // ISO 80000-11:2019, item 11-4.2 (from memory): Eu = Δp / (ρ v²).
        {"Euler", "Eu : 1\n\u0394p : Pa\n\u03C1 : kg/m^3\nv : m/s\n"
                  "Eu = \u0394p/(\u03C1*v^2)\n"},
        // ISO 80000-11:2019, item 11-4.3 (from memory): Fr = v / sqrt(l g).
        {"Froude", "Fr : 1\nv : m/s\nl : m\ng : m/s^2\n"
                   "Fr = v/sqrt(l*g)\n"},
        // ISO 80000-11:2019, item 11-4.4 (from memory): Gr = l³ g α_V ΔT / ν².
        {"Grashof", "Gr : 1\nl : m\ng : m/s^2\n\u03B1_V : 1/K\n\u0394T : K\n\u03BD : m^2/s\n"
                    "Gr = l^3*g*\u03B1_V*\u0394T/\u03BD^2\n"},
        // ISO 80000-11:2019, item 11-4.5 (from memory): We = ρ v² l / γ, γ surface tension.
        {"Weber", "We : 1\n\u03C1 : kg/m^3\nv : m/s\nl : m\n\u03B3 : N/m\n"
                  "We = \u03C1*v^2*l/\u03B3\n"},
        // ISO 80000-11:2019, item 11-4.6 (from memory): Ma = v / c, c speed of sound.
        {"Mach", "Ma : 1\nv, c : m/s\n"
                 "Ma = v/c\n"},
        // ISO 80000-11:2019, item 11-4.7 (from memory): Kn = λ / l, λ mean free path.
        {"Knudsen", "Kn : 1\n\u03BB, l : m\n"
                    "Kn = \u03BB/l\n"},
        // ISO 80000-11:2019, item 11-4.8 (from memory): Sr = l f / v.
        {"Strouhal", "Sr : 1\nl : m\nf : Hz\nv : m/s\n"
                     "Sr = l*f/v\n"},
        // ISO 80000-11:2019, clause 4 (item number from memory): Ca = η v / γ.
        {"capillary", "Ca : 1\n\u03B7 : Pa*s\nv : m/s\n\u03B3 : N/m\n"
                      "Ca = \u03B7*v/\u03B3\n"},
        // ISO 80000-11:2019, clause 4 (item number from memory): Eo = Δρ g l² / γ
        // (the Bond number is the same group).
        {"Bond / E\u00F6tv\u00F6s", "Eo, Bo : 1\n\u0394\u03C1 : kg/m^3\ng : m/s^2\nl : m\n"
                                    "\u03B3 : N/m\n"
                                    "Eo = \u0394\u03C1*g*l^2/\u03B3\n"
                                    "Bo = Eo\n"},
        // ISO 80000-11:2019, clause 4 (item number from memory): Cauchy number
        // Ca = ρ v² / K, K the bulk modulus (compression modulus).
        {"Cauchy", "Cy : 1\n\u03C1 : kg/m^3\nv : m/s\nK : Pa\n"
                   "Cy = \u03C1*v^2/K\n"},
        // ISO 80000-11:2019, item 11-5.1 (from memory): Fo = a t / l², a thermal diffusivity.
        {"Fourier", "Fo : 1\na : m^2/s\nt : s\nl : m\n"
                    "Fo = a*t/l^2\n"},
        // ISO 80000-11:2019, item 11-5.2 (from memory): Pe = v l / a.
        {"P\u00E9clet", "Pe : 1\nv : m/s\nl : m\na : m^2/s\n"
                        "Pe = v*l/a\n"},
        // ISO 80000-11:2019, item 11-5.3 (from memory): Ra = l³ g α_V ΔT / (ν a).
        {"Rayleigh", "Ra : 1\nl : m\ng : m/s^2\n\u03B1_V : 1/K\n\u0394T : K\n\u03BD, a : m^2/s\n"
                     "Ra = l^3*g*\u03B1_V*\u0394T/(\u03BD*a)\n"},
        // ISO 80000-11:2019, item 11-5.4 (from memory): Nu = K l / λ, K coefficient of heat
        // transfer, λ thermal conductivity of the fluid.
        {"Nusselt", "Nu : 1\nK : W/(m^2*K)\nl : m\n\u03BB : W/(m*K)\n"
                    "Nu = K*l/\u03BB\n"},
        // ISO 80000-11:2019, clause 5 (item number from memory): Bi = K l / λ_b, λ_b the
        // thermal conductivity of the body.
        {"Biot", "Bi : 1\nK : W/(m^2*K)\nl : m\n\u03BB_b : W/(m*K)\n"
                 "Bi = K*l/\u03BB_b\n"},
        // ISO 80000-11:2019, clause 5 (item number from memory): St = K / (ρ v c_p).
        {"Stanton", "St : 1\nK : W/(m^2*K)\n\u03C1 : kg/m^3\nv : m/s\nc_p : J/(kg*K)\n"
                    "St = K/(\u03C1*v*c_p)\n"},
        // ISO 80000-11:2019, clause 6 (item number from memory): Sh = k l / D, k mass transfer
        // coefficient, D diffusion coefficient ("Nusselt number for mass transfer").
        {"Sherwood", "Sh : 1\nk : m/s\nl : m\nD : m^2/s\n"
                     "Sh = k*l/D\n"},
        // ISO 80000-11:2019, item 11-7.1 (from memory): Pr = η / (ρ a); common practice also
        // writes η c_p / λ, which is the same group since a = λ / (ρ c_p).
        {"Prandtl", "Pr : 1\n\u03B7 : Pa*s\n\u03C1 : kg/m^3\na : m^2/s\nc_p : J/(kg*K)\n"
                    "\u03BB : W/(m*K)\n"
                    "Pr = \u03B7/(\u03C1*a)\n"
                    "Pr = \u03B7*c_p/\u03BB\n"},
        // ISO 80000-11:2019, item 11-7.2 (from memory): Sc = η / (ρ D).
        {"Schmidt", "Sc : 1\n\u03B7 : Pa*s\n\u03C1 : kg/m^3\nD : m^2/s\n"
                    "Sc = \u03B7/(\u03C1*D)\n"},
        // ISO 80000-11:2019, item 11-7.3 (from memory): Le = a / D.
        {"Lewis", "Le : 1\na, D : m^2/s\n"
                  "Le = a/D\n"},
    };
    for (const auto& number : numbers)
        holds(number);
}

TEST_CASE("characteristic numbers written wrongly are caught") {
    // Reynolds (ISO 80000-11:2019, item 11-4.1) with the kinematic viscosity in place of the
    // dynamic one: ρ v l / ν is [M L^-3], a density.
    fails({"Reynolds with ν for η", "Re : 1\n\u03C1 : kg/m^3\nv : m/s\nl : m\n\u03BD : m^2/s\n"
                                    "Re = \u03C1*v*l/\u03BD\n"},
          6);
    // Froude (ISO 80000-11:2019, item 11-4.3, from memory) without its square root:
    // v / (l g) is [L^-1 T].
    fails({"Froude without the root", "Fr : 1\nv : m/s\nl : m\ng : m/s^2\n"
                                      "Fr = v/(l*g)\n"},
          5);
    // Weber (item 11-4.5, from memory) with v for v²: [L^-1 T].
    fails({"Weber with v for v^2", "We : 1\n\u03C1 : kg/m^3\nv : m/s\nl : m\n\u03B3 : N/m\n"
                                   "We = \u03C1*v*l/\u03B3\n"},
          6);
    // Grashof (item 11-4.4, from memory) with ν for ν²: [L^2 T^-1].
    fails({"Grashof with ν for ν^2", "Gr : 1\nl : m\ng : m/s^2\n\u03B1_V : 1/K\n\u0394T : K\n"
                                     "\u03BD : m^2/s\n"
                                     "Gr = l^3*g*\u03B1_V*\u0394T/\u03BD\n"},
          7);
    // Prandtl (item 11-7.1, from memory) with ν for η: [M^-1 L^3].
    fails({"Prandtl with ν for η", "Pr : 1\n\u03BD, a : m^2/s\n\u03C1 : kg/m^3\n"
                                   "Pr = \u03BD/(\u03C1*a)\n"},
          4);
    // Nusselt (item 11-5.4, from memory) with a heat flux density (W/m²) for the coefficient
    // of heat transfer (W/(m² K)): [Θ] is left over.
    fails({"Nusselt with q for K", "Nu : 1\nq : W/m^2\nl : m\n\u03BB : W/(m*K)\n"
                                   "Nu = q*l/\u03BB\n"},
          5);
    // Stanton (clause 5, from memory) without the specific heat capacity: [L^2 T^-2 Θ^-1].
    fails({"Stanton without c_p", "St : 1\nK : W/(m^2*K)\n\u03C1 : kg/m^3\nv : m/s\n"
                                  "St = K/(\u03C1*v)\n"},
          5);
}

TEST_CASE("Bernoulli's equation in head form: every term is a length") {
    // Common practice: H = z + p/(ρ g) + V²/(2 g), each term a head in metres.
    holds({"Bernoulli", "H, z : m\np : Pa\n\u03C1 : kg/m^3\ng : m/s^2\nV : m/s\n"
                        "H = z + p/(\u03C1*g) + V^2/(2*g)\n"});
    const temp_dir dir;
    const auto context =
        dir.write("bernoulli.plumb", "z : m\np : Pa\n\u03C1 : kg/m^3\ng : m/s^2\nV : m/s\n");
    dimension_is("z", context, typed(0, 1, 0));
    dimension_is("p/(\u03C1*g)", context, typed(0, 1, 0));
    dimension_is("V^2/(2*g)", context, typed(0, 1, 0));
    // The same terms without g are energies per unit mass, not heads: mixing the two forms
    // is a sum-mismatch (common practice: p/ρ is [L^2 T^-2]).
    const auto mixed = plumb::check_text("bernoulli.plumb",
                                         "H, z : m\np : Pa\n\u03C1 : kg/m^3\ng : m/s^2\nV : m/s\n"
                                         "H = z + p/\u03C1 + V^2/(2*g)\n");
    INFO(listing(mixed));
    REQUIRE(mixed.diagnostics.size() == 1);
    CHECK(mixed.diagnostics.front().rule == plumb::rules::sum_mismatch);
}

TEST_CASE("dynamic viscosity is M L^-1 T^-1") {
    // Common practice: dynamic viscosity in Pa·s; the poise (cgs) has the same dimension.
    const temp_dir dir;
    const auto context = dir.write("viscosity.plumb", "\u03BC : Pa*s\n\u03BC_cgs : P\n"
                                                      "\u03BC_w : cP\n\u03BD : St\n");
    dimension_is("\u03BC", context, typed(1, -1, -1));
    dimension_is("\u03BC_cgs", context, typed(1, -1, -1));
    dimension_is("\u03BC_w", context, typed(1, -1, -1));
    // Kinematic viscosity (the stokes) is L^2 T^-1.
    dimension_is("\u03BD", context, typed(0, 2, -1));
    // Newton's law of viscosity, τ = μ du/dy, and ν = μ/ρ (common practice).
    holds({"Newton's law of viscosity", "\u03C4 : Pa\n\u03BC : Pa*s\nu : m/s\ny : m\n"
                                        "\u03C4 = \u03BC*deriv(u, y)\n"});
    holds({"kinematic viscosity", "\u03BD : m^2/s\n\u03BC : Pa*s\n\u03C1 : kg/m^3\n"
                                  "\u03BD = \u03BC/\u03C1\n"});
}

TEST_CASE("bulk modulus has the dimension of pressure, compressibility its inverse") {
    // Common practice: K = -V dp/dV, β = -(1/V) dV/dp = 1/K.
    holds({"bulk modulus", "K, p : Pa\nV : m^3\nK = -V*deriv(p, V)\n"});
    holds({"compressibility", "\u03B2 : 1/Pa\nK, p : Pa\nV : m^3\n"
                              "\u03B2 = -1/V*deriv(V, p)\n"
                              "\u03B2 = 1/K\n"});
    const temp_dir dir;
    const auto context = dir.write("bulk.plumb", "K : Pa\n\u03B2 : 1/Pa\n");
    dimension_is("K", context, typed(1, -1, -2));
    dimension_is("\u03B2", context, typed(-1, 1, 2));
    dimension_is("K*\u03B2", context, dimension{});
}

TEST_CASE("SI derived units with special names reduce to base dimensions") {
    // SI Brochure 9th ed., Table 4, the column "expressed in terms of SI base units".
    struct derived {
        const char* unit;
        dimension expected;
    };
    const auto& table4 = plumb::test::si_derived_units();
    // SI Brochure 9th ed., Table 2: the base units themselves.
    const derived table2[] = {
        {"m", typed(0, 1, 0)},
        {"kg", typed(1, 0, 0)},
        {"s", typed(0, 0, 1)},
        {"A", typed(0, 0, 0, 0, 0, 1)},
        {"K", typed(0, 0, 0, 1)},
        {"mol", typed(0, 0, 0, 0, 1)},
        {"cd", typed(0, 0, 0, 0, 0, 0, 1)},
    };
    std::string declarations;
    int index = 0;
    for (const auto& d : table4)
        declarations += fmt::format("x{} : {}\n", index++, d.symbol);
    for (const auto& d : table2)
        declarations += fmt::format("x{} : {}\n", index++, d.unit);
    const temp_dir dir;
    const auto context = dir.write("si.plumb", declarations);
    index = 0;
    for (const auto& d : table4) {
        INFO("unit: ", d.symbol);
        dimension_is(fmt::format("x{}", index++), context, d.dim);
    }
    for (const auto& d : table2) {
        INFO("unit: ", d.unit);
        dimension_is(fmt::format("x{}", index++), context, d.expected);
    }
}

TEST_CASE("SI derived units relate to each other as Table 4 says") {
    // SI Brochure 9th ed., Table 4, the column "expressed in terms of other SI units":
    // Pa = N/m², J = N m, W = J/s, V = W/A, F = C/V, Ω = V/A, S = A/V, Wb = V s, T = Wb/m²,
    // H = Wb/A, lx = lm/m², Gy = J/kg, Sv = J/kg. Written as formulas, each must hold.
    holds({"SI Table 4 relations", "p : Pa\nF : N\nA : m^2\nE : J\nl : m\nP : W\nt : s\n"
                                   "U : V\nI : A\nC_e : F\nQ : C\nR : \u03A9\nG : S\n"
                                   "\u03A6 : Wb\nB : T\nL_i : H\nE_v : lx\n\u03A6_v : lm\n"
                                   "D : Gy\nH_d : Sv\nm : kg\n"
                                   "p = F/A\n"
                                   "E = F*l\n"
                                   "P = E/t\n"
                                   "U = P/I\n"
                                   "C_e = Q/U\n"
                                   "R = U/I\n"
                                   "G = I/U\n"
                                   "\u03A6 = U*t\n"
                                   "B = \u03A6/A\n"
                                   "L_i = \u03A6/I\n"
                                   "E_v = \u03A6_v/A\n"
                                   "D = E/m\n"
                                   "H_d = E/m\n"});
}
