// Dimensionless groups of published examples. Every expected exponent vector below was worked
// out by hand from the example's variables and the documented choice of repeating variables;
// the published groups beside them (with their sources) must span the same set, since any
// complete set of groups is a recombination of any other (products and powers).
#include "groups_examples.hpp"

#include "plumb/groups.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <cstdint>
#include <string>
#include <vector>

namespace {

using plumb::dimension;
using plumb::group_request;
using plumb::group_variable;
using plumb::rational;
using plumb::test::dim;
using plumb::test::worked_example;
namespace dims = plumb::test::dims;

using exponents = std::vector<rational>;

const rational half(1, 2);

struct expected_group {
    exponents e;
    std::string formula;
};

struct expectation {
    std::size_t rank;
    std::vector<std::size_t> repeating; // in the order the rule picks them
    std::vector<expected_group> groups; // the dependent variable's first
    std::vector<exponents> published;   // the source's own groups
};

// The dimension of a group by the algebra of dimensions, independent of the elimination.
dimension dimension_of(const std::vector<group_variable>& variables, const exponents& e) {
    dimension d;
    for (std::size_t i = 0; i < variables.size(); ++i)
        d = d * variables[i].dim.pow(e[i]);
    return d;
}

// The rank of a set of exponent vectors (as columns).
std::size_t rank_of(const std::vector<exponents>& vectors, std::size_t length) {
    plumb::rational_matrix m(length, vectors.size());
    for (std::size_t c = 0; c < vectors.size(); ++c)
        for (std::size_t r = 0; r < length; ++r)
            m.at(r, c) = vectors[c][r];
    return plumb::matrix_rank(m);
}

std::string listing(const plumb::group_analysis& a) {
    std::string out;
    for (const auto& p : a.problems)
        out += "problem: " + p + "\n";
    for (const auto& g : a.groups)
        out += "group: " + g.formula + "\n";
    return out;
}

void verify(const worked_example& ex, const expectation& want) {
    INFO(ex.name);
    const auto got = plumb::analyse_groups(ex.request());
    INFO(listing(got));
    REQUIRE(got.problems.empty());
    CHECK(got.rank == want.rank);
    CHECK(got.repeating_chosen);
    CHECK(got.repeating == want.repeating);
    REQUIRE(got.groups.size() == ex.variables.size() - want.rank);
    REQUIRE(got.groups.size() == want.groups.size());
    for (std::size_t i = 0; i < got.groups.size(); ++i) {
        const auto& g = got.groups[i];
        INFO("group " << i + 1 << ": " << g.formula);
        CHECK(g.exponents == want.groups[i].e);
        CHECK(g.formula == want.groups[i].formula);
        CHECK(dimension_of(ex.variables, g.exponents).is_dimensionless());
        CHECK(g.has_dependent == (i == 0 && ex.dependent.has_value()));
    }
    // The published set and ours are the same set up to recombination exactly when each is
    // independent and together they span no more than either.
    std::vector<exponents> ours;
    for (const auto& g : got.groups)
        ours.push_back(g.exponents);
    std::vector<exponents> both = ours;
    both.insert(both.end(), want.published.begin(), want.published.end());
    const std::size_t n = ex.variables.size();
    for (const auto& p : want.published)
        CHECK(dimension_of(ex.variables, p).is_dimensionless());
    CHECK(rank_of(ours, n) == ours.size());
    CHECK(rank_of(want.published, n) == ours.size());
    CHECK(rank_of(both, n) == ours.size());
}

std::vector<std::string> problems_for(const group_request& request) {
    return plumb::analyse_groups(request).problems;
}

bool mentions(const std::vector<std::string>& problems, const std::string& text) {
    return std::any_of(problems.begin(), problems.end(),
                       [&](const std::string& p) { return p.find(text) != std::string::npos; });
}

} // namespace

TEST_SUITE_BEGIN("groups");

TEST_CASE("the dimension matrix has a row per base dimension that occurs, in SI order") {
    const auto ex = plumb::test::cylinder_crossflow(); // h, D, V, ρ, μ, c_p, k
    const auto m = plumb::build_dimension_matrix(ex.variables);
    using plumb::base_dimension;
    CHECK(m.rows == std::vector<base_dimension>{base_dimension::mass, base_dimension::length,
                                                base_dimension::time, base_dimension::temperature});
    REQUIRE(m.values.rows() == 4);
    REQUIRE(m.values.cols() == 7);
    // Column of k, thermal conductivity [M L T^-3 Θ^-1]; column of ρ [M L^-3].
    CHECK(m.values.at(0, 6) == 1);
    CHECK(m.values.at(1, 6) == 1);
    CHECK(m.values.at(2, 6) == -3);
    CHECK(m.values.at(3, 6) == -1);
    CHECK(m.values.at(1, 3) == -3);
    CHECK(m.values.at(3, 3) == 0);

    const auto weir = plumb::build_dimension_matrix(plumb::test::weir().variables);
    CHECK(weir.rows == std::vector<base_dimension>{base_dimension::length, base_dimension::time});
}

TEST_CASE("drag on a sphere: drag coefficient form and Reynolds number") {
    // White, Fluid Mechanics, 7th ed., §5.1, Eq. (5.2) (equation number from memory):
    // F/(ρV²D²) = g(ρVD/μ). Our second group is μ/(ρVD), the inverse of Re.
    verify(plumb::test::sphere_drag(), // F, ρ, V, D, μ
           {3,
            {1, 2, 3},
            {{{1, -1, -2, -2, 0}, "F/(ρ*V^2*D^2)"}, {{0, -1, -1, -1, 1}, "μ/(ρ*V*D)"}},
            {{1, -1, -2, -2, 0}, {0, 1, 1, 1, -1}}});
}

TEST_CASE("pressure drop in a smooth pipe") {
    // Munson et al., Fundamentals of Fluid Mechanics, §7.3 (from memory):
    // D Δp_ℓ/(ρV²) = φ(ρVD/μ).
    verify(plumb::test::smooth_pipe(), // Δp_ℓ, D, ρ, μ, V
           {3,
            {2, 4, 1},
            {{{1, 1, -1, 0, -2}, "Δp_ℓ*D/(ρ*V^2)"}, {{0, -1, -1, 1, -1}, "μ/(D*ρ*V)"}},
            {{1, 1, -1, 0, -2}, {0, 1, 1, -1, 1}}});
}

TEST_CASE("pressure drop in a rough pipe adds the relative roughness") {
    // Munson et al., ch. 8, the Moody chart's parameters Re and ε/D (from memory).
    verify(plumb::test::rough_pipe(), // Δp_ℓ, D, ρ, μ, V, ε
           {3,
            {2, 4, 1},
            {{{1, 1, -1, 0, -2, 0}, "Δp_ℓ*D/(ρ*V^2)"},
             {{0, -1, -1, 1, -1, 0}, "μ/(D*ρ*V)"},
             {{0, -1, 0, 0, 0, 1}, "ε/D"}},
            {{1, 1, -1, 0, -2, 0}, {0, 1, 1, -1, 1, 0}, {0, -1, 0, 0, 0, 1}}});
}

TEST_CASE("simple pendulum: one group, the mass drops out") {
    // Çengel & Cimbala, Fluid Mechanics, ch. 7 (from memory); T = 2π√(L/g), so T√(g/L) is
    // constant. With m listed, M occurs, the rank is 3, and m's exponent must come out 0.
    verify(plumb::test::pendulum(), // T, L, g, m
           {3, {1, 3, 2}, {{{1, -half, half, 0}, "T*g^(1/2)/L^(1/2)"}}, {{2, -1, 1, 0}}});
}

TEST_CASE("flow over a weir") {
    // Munson et al., ch. 7, the rectangular weir (from memory): Q/(√g H^(5/2)) = φ(b/H).
    verify(plumb::test::weir(), // Q, g, H, b
           {2,
            {2, 1},
            {{{1, -half, -rational(5, 2), 0}, "Q/(g^(1/2)*H^(5/2))"}, {{0, 0, -1, 1}, "b/H"}},
            {{2, -1, -5, 0}, {0, 0, -1, 1}}});
}

TEST_CASE("deep-water and shallow-water waves") {
    // White, 7th ed., ch. 10 (from memory): c = √(gλ/2π) in deep water, c = √(gh) in shallow.
    verify(plumb::test::deep_water_waves(), // c, g, λ
           {2, {2, 1}, {{{1, -half, -half}, "c/(g^(1/2)*λ^(1/2))"}}, {{2, -1, -1}}});
    verify(plumb::test::shallow_water_waves(), // c, g, h
           {2, {2, 1}, {{{1, -half, -half}, "c/(g^(1/2)*h^(1/2))"}}, {{2, -1, -1}}});
}

TEST_CASE("a drop with surface tension: the Weber number") {
    // White, 7th ed., Table 5.2 (from memory): We = ρV²L/σ. Ours is σ/(ρV²D), its inverse.
    verify(plumb::test::droplet(), // d, D, ρ, V, σ
           {3,
            {2, 3, 1},
            {{{1, -1, 0, 0, 0}, "d/D"}, {{0, -1, -1, -2, 1}, "σ/(D*ρ*V^2)"}},
            {{1, -1, 0, 0, 0}, {0, 1, 1, 2, -1}}});
}

TEST_CASE("pump scaling: flow, head and power coefficients and the Reynolds number") {
    // White, 7th ed., §11.4 (section from memory): C_Q = Q/(ND³), C_H = gH/(N²D²),
    // C_P = P/(ρN³D⁵), Re = ρND²/μ.
    verify(plumb::test::pump(), // Q, N, D, gH, P, ρ, μ; the dependent is gH
           {3,
            {5, 2, 1},
            {{{0, -2, -2, 1, 0, 0, 0}, "gH/(N^2*D^2)"},
             {{1, -1, -3, 0, 0, 0, 0}, "Q/(N*D^3)"},
             {{0, -3, -5, 0, 1, -1, 0}, "P/(N^3*D^5*ρ)"},
             {{0, -1, -2, 0, 0, -1, 1}, "μ/(N*D^2*ρ)"}},
            {{1, -1, -3, 0, 0, 0, 0},
             {0, -2, -2, 1, 0, 0, 0},
             {0, -3, -5, 0, 1, -1, 0},
             {0, 1, 2, 0, 0, 1, -1}}});
}

TEST_CASE("heat transfer from a cylinder in cross flow: Nusselt, Reynolds, Prandtl") {
    // Incropera et al., ch. 7 (from memory): Nu_D = hD/k = f(Re_D, Pr). The rule picks ρ, V, D
    // and c_p, so the basis is Stanton h/(ρVc_p), 1/Re and 1/Pe = k/(ρVDc_p);
    // Nu = St·Re·Pr and Pr = Pe/Re recombine them.
    verify(plumb::test::cylinder_crossflow(), // h, D, V, ρ, μ, c_p, k
           {4,
            {3, 2, 1, 5},
            {{{1, 0, -1, -1, 0, -1, 0}, "h/(V*ρ*c_p)"},
             {{0, -1, -1, -1, 1, 0, 0}, "μ/(D*V*ρ)"},
             {{0, -1, -1, -1, 0, -1, 1}, "k/(D*V*ρ*c_p)"}},
            {{1, 1, 0, 0, 0, 0, -1}, {0, 1, 1, 1, -1, 0, 0}, {0, 0, 0, 0, 1, 1, -1}}});
}

TEST_CASE("natural convection: Nusselt, Grashof, Prandtl") {
    // Incropera et al., ch. 9 (from memory): Gr_L = gβΔT L³/ν², Nu_L = f(Gr_L, Pr).
    // ν is kinematic, so it comes before ΔT (a temperature) among the repeating variables.
    const auto ex = plumb::test::natural_convection(); // h, L, gβ, ΔT, ν, α, k
    verify(ex, {4,
                {1, 4, 3, 6},
                {{{1, 1, 0, 0, 0, 0, -1}, "h*L/k"},
                 {{0, 3, 1, 1, -2, 0, 0}, "L^3*gβ*ΔT/ν^2"},
                 {{0, 0, 0, 0, -1, 1, 0}, "α/ν"}},
                {{1, 1, 0, 0, 0, 0, -1}, {0, 3, 1, 1, -2, 0, 0}, {0, 0, 0, 0, 1, -1, 0}}});
    // The Rayleigh number Ra = Gr·Pr = gβΔT L³/(να) may replace Gr (Incropera, ch. 9).
    verify(ex, {4,
                {1, 4, 3, 6},
                {{{1, 1, 0, 0, 0, 0, -1}, "h*L/k"},
                 {{0, 3, 1, 1, -2, 0, 0}, "L^3*gβ*ΔT/ν^2"},
                 {{0, 0, 0, 0, -1, 1, 0}, "α/ν"}},
                {{1, 1, 0, 0, 0, 0, -1}, {0, 3, 1, 1, -1, -1, 0}, {0, 0, 0, 0, 1, -1, 0}}});
}

TEST_CASE("vortex shedding: Strouhal and Reynolds numbers") {
    // White, 7th ed., Table 5.2 (from memory): St = fL/V.
    verify(plumb::test::vortex_shedding(), // f, V, D, ρ, μ
           {3,
            {3, 1, 2},
            {{{1, -1, 1, 0, 0}, "f*D/V"}, {{0, -1, -1, -1, 1}, "μ/(V*D*ρ)"}},
            {{1, -1, 1, 0, 0}, {0, 1, 1, 1, -1}}});
}

TEST_CASE("rank-deficient: mass and time only appear together, as in a soap bubble") {
    // Çengel & Cimbala, ch. 7, Example 7-7 (example number from memory): three base dimensions
    // occur but the rank is 2, so there is n - rank = 1 group, Δp R/σ.
    const auto ex = plumb::test::soap_bubble(); // Δp, R, σ
    CHECK(plumb::build_dimension_matrix(ex.variables).rows.size() == 3);
    verify(ex, {2, {1, 2}, {{{1, 1, -1}, "Δp*R/σ"}}, {{1, 1, -1}}});
}

TEST_CASE("a dimensionless variable is a group of its own and never repeats") {
    // An angle of attack alongside the sphere's variables (common practice: lift and drag
    // depend on it). Count is still n - rank = 6 - 3.
    auto ex = plumb::test::sphere_drag();
    ex.variables.push_back({"θ", dimension{}});
    verify(ex, {3,
                {1, 2, 3},
                {{{1, -1, -2, -2, 0, 0}, "F/(ρ*V^2*D^2)"},
                 {{0, -1, -1, -1, 1, 0}, "μ/(ρ*V*D)"},
                 {{0, 0, 0, 0, 0, 1}, "θ"}},
                {{1, -1, -2, -2, 0, 0}, {0, 1, 1, 1, -1, 0}, {0, 0, 0, 0, 0, 1}}});
}

TEST_CASE("without a dependent variable every group is scaled to whole exponents") {
    // The pendulum's group with no dependent: T² g/L, the square of T√(g/L), with the
    // leading variable's exponent positive.
    auto ex = plumb::test::pendulum();
    ex.dependent.reset();
    const auto got = plumb::analyse_groups(ex.request());
    REQUIRE(got.problems.empty());
    REQUIRE(got.groups.size() == 1);
    CHECK(got.groups[0].exponents == exponents{2, -1, 1, 0});
    CHECK(got.groups[0].formula == "T^2*g/L");
    CHECK_FALSE(got.groups[0].has_dependent);
}

TEST_CASE("repeating variables given by the user are used as given") {
    // With ρ, V and μ repeating the sphere's groups become Fρ/μ² and ρVD/μ (White, 7th ed.,
    // §5.1 discusses this alternative drag parameter; from memory).
    const auto ex = plumb::test::sphere_drag(); // F, ρ, V, D, μ
    auto request = ex.request();
    request.repeating = {1, 2, 4};
    const auto got = plumb::analyse_groups(request);
    INFO(listing(got));
    REQUIRE(got.problems.empty());
    CHECK_FALSE(got.repeating_chosen);
    CHECK(got.repeating == std::vector<std::size_t>{1, 2, 4});
    REQUIRE(got.groups.size() == 2);
    CHECK(got.groups[0].exponents == exponents{1, 1, 0, 0, -2});
    CHECK(got.groups[0].formula == "F*ρ/μ^2");
    CHECK(got.groups[1].exponents == exponents{0, 1, 1, 1, -1});
    CHECK(got.groups[1].formula == "ρ*V*D/μ");
}

TEST_CASE("dependent repeating variables are refused with the dependency spelled out") {
    // ν = μ/ρ by definition (ISO 80000-4, kinematic viscosity).
    auto ex = plumb::test::sphere_drag();
    ex.variables.push_back({"ν", dims::kinematic_viscosity}); // F, ρ, V, D, μ, ν
    auto request = ex.request();
    request.repeating = {1, 4, 5};
    const auto got = plumb::analyse_groups(request);
    CHECK(got.groups.empty());
    CHECK(got.problems == std::vector<std::string>{
                              "repeating variables must be dimensionally independent: 'ν' has the "
                              "dimension of μ/ρ, so ρ, μ and ν are not independent"});

    // Two lengths cannot both repeat.
    auto rough = plumb::test::rough_pipe().request(); // Δp_ℓ, D, ρ, μ, V, ε
    rough.repeating = {1, 2, 5};
    CHECK(problems_for(rough) ==
          std::vector<std::string>{"repeating variables must be dimensionally independent: 'ε' "
                                   "has the dimension of D, so D and ε are not independent"});

    // A dimensionless variable adds nothing to the repeating set.
    auto angle = plumb::test::sphere_drag();
    angle.variables.push_back({"θ", dimension{}});
    auto with_angle = angle.request();
    with_angle.repeating = {1, 5, 2};
    CHECK(problems_for(with_angle) ==
          std::vector<std::string>{"repeating variables must be dimensionally independent: 'θ' "
                                   "is dimensionless, so it cannot repeat"});
}

TEST_CASE("too few or too many repeating variables are refused, saying how many are needed") {
    auto request = plumb::test::sphere_drag().request();
    request.repeating = {1, 2};
    CHECK(problems_for(request) ==
          std::vector<std::string>{"3 repeating variables are needed (the rank of the dimension "
                                   "matrix), 2 were given"});
    request.repeating = {1, 2, 3, 4};
    CHECK(problems_for(request) ==
          std::vector<std::string>{"3 repeating variables are needed (the rank of the dimension "
                                   "matrix), 4 were given"});
    auto waves = plumb::test::deep_water_waves().request();
    waves.repeating = {2};
    CHECK(problems_for(waves) ==
          std::vector<std::string>{"2 repeating variables are needed (the rank of the dimension "
                                   "matrix), 1 was given"});
}

TEST_CASE("the dependent variable cannot repeat") {
    auto request = plumb::test::sphere_drag().request();
    request.repeating = {0, 2, 3};
    const auto got = plumb::analyse_groups(request);
    CHECK(got.groups.empty());
    CHECK(got.problems ==
          std::vector<std::string>{"'F' is the dependent variable, so it cannot repeat: it would "
                                   "appear in every group instead of standing alone in one"});
}

TEST_CASE("repeating variables that do not exist or appear twice are refused") {
    auto request = plumb::test::sphere_drag().request();
    request.repeating = {1, 2, 9};
    CHECK(mentions(problems_for(request), "repeating variable number 10 does not exist"));
    request.repeating = {1, 2, 2};
    CHECK(mentions(problems_for(request), "'V' is named more than once"));
}

TEST_CASE("a dependent variable no other variable can balance is reported") {
    // F [M L T^-2] against V, D and L: nothing else carries mass.
    const group_request request{
        {{"F", dims::force}, {"V", dims::speed}, {"D", dims::length}, {"L", dims::length}},
        {0},
        {}};
    const auto got = plumb::analyse_groups(request);
    CHECK(got.groups.empty());
    CHECK(got.problems ==
          std::vector<std::string>{"'F' cannot enter any dimensionless group: no combination of "
                                   "the other variables has its dimension [M L T^-2], so a "
                                   "variable it depends on is missing"});
}

TEST_CASE("independent variables form no group, and that is reported") {
    const group_request request{
        {{"ρ", dims::density}, {"V", dims::speed}, {"D", dims::length}}, {}, {}};
    const auto got = plumb::analyse_groups(request);
    CHECK(got.rank == 3);
    CHECK(got.groups.empty());
    CHECK(mentions(got.problems, "no dimensionless group can be formed"));
    CHECK(mentions(problems_for({}), "no variables"));
    auto out_of_range = plumb::test::sphere_drag().request();
    out_of_range.dependents = {5};
    CHECK(mentions(problems_for(out_of_range), "not among the 5 variables"));
}

TEST_CASE("the rule prefers density, speed and length, then the fewest total exponents") {
    // Declared in reverse of the preference, with a second length and a frequency: the rule must
    // still pick ρ, V, D (D before d because it is declared first).
    const group_request request{{{"μ", dims::viscosity},
                                 {"f", dims::frequency},
                                 {"D", dims::length},
                                 {"d", dims::length},
                                 {"V", dims::speed},
                                 {"ρ", dims::density}},
                                {},
                                {}};
    const auto got = plumb::analyse_groups(request);
    REQUIRE(got.problems.empty());
    CHECK(got.repeating == std::vector<std::size_t>{5, 4, 2});
    // Without a density or a speed: a length, then f [T^-1] (total 1) before μ (total 3).
    const group_request no_density{
        {{"μ", dims::viscosity}, {"f", dims::frequency}, {"D", dims::length}, {"F", dims::force}},
        {},
        {}};
    const auto second = plumb::analyse_groups(no_density);
    REQUIRE(second.problems.empty());
    CHECK(second.repeating == std::vector<std::size_t>{2, 1, 0});
}

TEST_CASE("exponents beyond 64 bits are a problem, never a wrapped answer or an exception") {
    const rational huge(4'000'000'000'000'000'000);
    // x^3 / y^(4e18) is the group, but its dimension check needs 3 * 4e18 > 2^63.
    const group_request request{
        {{"y", dim(0, huge, 0)}, {"x", dim(0, 3, 0)}, {"z", dim(0, 5, 0)}}, {}, {}};
    plumb::group_analysis got;
    CHECK_NOTHROW(got = plumb::analyse_groups(request));
    CHECK(got.groups.empty());
    CHECK(mentions(got.problems, "exceed the exact 64-bit range"));

    // Elimination itself overflows here.
    const group_request mixed{
        {{"a", dim(0, huge, 3)}, {"b", dim(0, 3, huge)}, {"c", dim(0, 1, 0)}, {"e", dim(1, 0, 7)}},
        {},
        {}};
    CHECK_NOTHROW(got = plumb::analyse_groups(mixed));
    CHECK(got.groups.empty());
    CHECK(mentions(got.problems, "exceed the exact 64-bit range"));

    // User-given repeating variables go through the same guard.
    auto given = request;
    given.repeating = {0};
    CHECK_NOTHROW(got = plumb::analyse_groups(given));
    CHECK(mentions(got.problems, "exceed the exact 64-bit range"));
}

TEST_CASE("large exponents that do fit are still answered exactly") {
    const rational big(2'000'000'000'000'000'000);
    const group_request request{{{"x", dim(0, big * 2, 0)}, {"y", dim(0, big, 0)}}, {}, {}};
    const auto got = plumb::analyse_groups(request);
    INFO(listing(got));
    REQUIRE(got.problems.empty());
    CHECK(got.repeating == std::vector<std::size_t>{1});
    REQUIRE(got.groups.size() == 1);
    CHECK(got.groups[0].exponents == exponents{1, -2});
    CHECK(got.groups[0].formula == "x/y^2");
}

TEST_SUITE_END();
