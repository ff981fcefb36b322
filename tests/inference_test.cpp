// Dimension inference for "X : ?" symbols and "k?" coefficients, and the restatement of
// unit-bound empirical coefficients for coherent SI units.
//
// Two kinds of test: those under "inference:" parse the text and call infer_dimensions
// directly (with a symbol table built here as the session builds it), so they test this module
// alone; those under "inference through check_text" go through the library's front door and
// pass only once the session calls infer_dimensions (they are the integration's tests).
//
// Published coefficients are compared with the ones recomputed from unit factors to the
// published value's printed precision. Unit factors: NIST SP 811 (2008), Appendix B (ft =
// 0.3048 m exactly, bbl = 0.158987294928 m^3, psi = 6894.757293168 Pa, cP = 0.001 Pa*s,
// millidarcy = 9.869233e-16 m^2, day = 86400 s).
#include "check/inference.hpp"
#include "notation/parser.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <cmath>
#include <memory>
#include <numbers>
#include <stdexcept>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

using plumb::diagnostic;
using plumb::dimension;
using plumb::rational;
using plumb::severity;

namespace {

// NIST SP 811 (2008), Appendix B.
constexpr double ft = 0.3048;
constexpr double bbl = 0.158987294928;
constexpr double day = 86400.0;
constexpr double psi = 6894.757293168;
constexpr double cP = 0.001;
constexpr double millidarcy = 9.869233e-16;

// True when `value` rounds to `published` at the published value's last printed decimal.
bool rounds_to(double value, double published, int decimals) {
    return std::abs(value - published) <= 0.5 * std::pow(10.0, -decimals) * (1 + 1e-12);
}

struct run {
    std::unique_ptr<plumb::source_file> source;
    std::vector<diagnostic> diagnostics;

    [[nodiscard]] std::uint32_t line(const diagnostic& d) const {
        return source->position(d.where.range.begin).line;
    }
    [[nodiscard]] std::vector<const diagnostic*> with_rule(std::string_view rule) const {
        std::vector<const diagnostic*> out;
        for (const auto& d : diagnostics)
            if (d.rule == rule)
                out.push_back(&d);
        return out;
    }
    // The diagnostic whose message starts with `prefix`; fails the test when there is none.
    [[nodiscard]] const diagnostic& about(std::string_view prefix) const {
        for (const auto& d : diagnostics)
            if (std::string_view(d.message).starts_with(prefix))
                return d;
        FAIL("no diagnostic starts with: " << std::string(prefix));
        throw std::logic_error("unreachable");
    }
};

// Parses `text` and infers, the symbol table built from the file's declarations as the
// session builds it (unit text and SI factor for declarations by unit).
run infer(std::string text) {
    run r;
    r.source = std::make_unique<plumb::source_file>("test.plumb", std::move(text));
    const plumb::syntax::parsed_file tree = plumb::parse_file(*r.source);
    REQUIRE_MESSAGE(!tree.has_syntax_error, "the test's own text does not parse");
    plumb::symbol_table table;
    for (const auto& n : tree.names) {
        const auto& decl = tree.declarations[n.declaration];
        plumb::symbol_entry e;
        e.dim = decl.kind.dim;
        e.declared_at = {r.source.get(), n.name};
        e.to_infer = decl.kind.to_infer;
        e.local = true;
        if (decl.kind.by_unit) {
            e.unit_text = r.source->text(decl.spec);
            e.si_factor = decl.kind.si_factor;
        }
        table.insert(r.source->text(n.name), e);
    }
    plumb::infer_dimensions(tree, tree.formulas, table, r.diagnostics);
    return r;
}

dimension dim(std::initializer_list<std::pair<plumb::base_dimension, rational>> exponents) {
    std::array<rational, plumb::base_dimension_count> e{};
    for (const auto& [b, x] : exponents)
        e[static_cast<std::size_t>(b)] = x;
    return dimension::from_exponents(e);
}

constexpr auto M = plumb::base_dimension::mass;
constexpr auto L = plumb::base_dimension::length;
constexpr auto T = plumb::base_dimension::time;

bool has_note(const diagnostic& d, std::string_view part) {
    for (const auto& n : d.notes)
        if (n.message.find(part) != std::string::npos)
            return true;
    return false;
}

} // namespace

// ---- Determined ----------------------------------------------------------------------------

TEST_CASE("inference: a symbol fixed by one equation") {
    const run r = infer("X : ?\n"
                        "F : N\n"
                        "A : m^2\n"
                        "X = F/A\n");
    REQUIRE(r.diagnostics.size() == 1);
    const diagnostic& d = r.diagnostics[0];
    CHECK(d.level == severity::note);
    CHECK(d.rule == plumb::rules::inferred_dimension);
    // N/m^2 = kg m^-1 s^-2.
    CHECK(d.message == "'X' must have dimension [M L^-1 T^-2] (pressure or stress)");
    CHECK(r.line(d) == 1); // at the declaration
    REQUIRE(d.terms.size() == 1);
    CHECK(d.terms[0].dim == dim({{M, 1}, {L, -1}, {T, -2}}));
}

TEST_CASE("inference: two unknowns fixed only by two equations together") {
    // X*Y = L and X/Y = L/T^2 give X^2 = L^2 T^-2: X = [L T^-1], then Y = L/X = [T].
    const run r = infer("X, Y : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@product X*Y = d\n"
                        "@quotient X/Y = d/t^2\n");
    REQUIRE(r.diagnostics.size() == 2);
    CHECK(r.about("'X'").terms.at(0).dim == dim({{L, 1}, {T, -1}}));
    CHECK(r.about("'X'").message == "'X' must have dimension [L T^-1] (velocity)");
    CHECK(r.about("'Y'").terms.at(0).dim == dim({{T, 1}}));
    CHECK(r.about("'Y'").level == severity::note);
}

TEST_CASE("inference: a symbol fixed twice alike is no conflict") {
    const run r = infer("X : ?\n"
                        "d, h : m\n"
                        "X = d\n"
                        "X = 2*h + d\n"
                        "X <= 3*d\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].level == severity::note);
    CHECK(r.diagnostics[0].terms.at(0).dim == dim({{L, 1}}));
}

TEST_CASE("inference: function arguments and exponents constrain") {
    // exp needs a dimensionless argument: k*t dimensionless makes k [T^-1]. sqrt halves:
    // sqrt(Z) = v makes Z [L^2 T^-2]. min's arguments agree: W = [L].
    const run r = infer("k, Z, W : ?\n"
                        "t : s\n"
                        "v : m/s\n"
                        "d : m\n"
                        "c : 1\n"
                        "c = exp(-k*t)\n"
                        "v = sqrt(Z)\n"
                        "d = min(W, 2*d)\n");
    CHECK(r.about("'k'").terms.at(0).dim == dim({{T, -1}}));
    CHECK(r.about("'Z'").terms.at(0).dim == dim({{L, 2}, {T, -2}}));
    CHECK(r.about("'W'").terms.at(0).dim == dim({{L, 1}}));
}

TEST_CASE("inference: quantities in braces, named constants and limits") {
    // 9.81 {m/s^2} * t is [L T^-1]; {g_n} (standard gravity) over Y is [T^-1] when Y = [L T^-1];
    // 0 <= W <= d: the 0 agrees with anything, so W = [L].
    const run r = infer("X, Y, W : ?\n"
                        "t : s\n"
                        "d : m\n"
                        "X = 9.81 {m/s^2} * t\n"
                        "1/t = {g_n} / Y\n"
                        "0 <= W <= d\n");
    CHECK(r.about("'X'").terms.at(0).dim == dim({{L, 1}, {T, -1}}));
    CHECK(r.about("'Y'").terms.at(0).dim == dim({{L, 1}, {T, -1}}));
    CHECK(r.about("'W'").terms.at(0).dim == dim({{L, 1}}));
}

TEST_CASE("inference: derivatives and integrals") {
    // tau = mu * deriv(u, y): mu = [M L^-1 T^-2] / [T^-1] = [M L^-1 T^-1].
    // W = integral(p, V): p = [M L^2 T^-2] / [L^3] = [M L^-1 T^-2].
    const run r = infer("mu, p : ?\n"
                        "tau : Pa\n"
                        "u : m/s\n"
                        "y : m\n"
                        "W : J\n"
                        "V, V_1, V_2 : m^3\n"
                        "tau = mu * deriv(u, y)\n"
                        "W = integral(p, V, V_1, V_2)\n");
    CHECK(r.about("'mu'").terms.at(0).dim == dim({{M, 1}, {L, -1}, {T, -1}}));
    CHECK(r.about("'p'").terms.at(0).dim == dim({{M, 1}, {L, -1}, {T, -2}}));
}

// ---- Free ----------------------------------------------------------------------------------

TEST_CASE("inference: two unknowns only ever multiplied together are free") {
    const run r = infer("X, Y : ?\n"
                        "P : W\n"
                        "P = X*Y\n");
    REQUIRE(r.diagnostics.size() == 2);
    for (const auto& d : r.diagnostics) {
        CHECK(d.level == severity::warning);
        CHECK(d.rule == plumb::rules::inferred_dimension);
        // One equation in two unknowns: one of them may be chosen.
        CHECK(d.message.find("free (1 degree of freedom)") != std::string::npos);
        // W = kg m^2 s^-3.
        CHECK(has_note(d, "'X*Y', as [M L^2 T^-3] (power)"));
    }
    CHECK(r.about("the formulas leave the dimension of 'X'").where.range.begin == 0);
}

TEST_CASE("inference: a variable exponent on an unknown base constrains nothing") {
    const run r = infer("X : ?\n"
                        "n, c : 1\n"
                        "c = X^n\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].level == severity::warning);
    CHECK(r.diagnostics[0].message.find("free") != std::string::npos);
    CHECK(has_note(r.diagnostics[0], "nothing in the formulas constrains it"));
}

TEST_CASE("inference: a ? symbol no formula uses") {
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "d = d\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].level == severity::warning);
    CHECK(r.diagnostics[0].message == "'X' is declared with ? but no formula uses it");
    // A dictionary (no formulas at all) is not told.
    CHECK(infer("X : ?\n").diagnostics.empty());
}

// ---- Conflict ------------------------------------------------------------------------------

TEST_CASE("inference: two equations that disagree, both named") {
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@length X = d\n"
                        "@time X = t\n");
    REQUIRE(r.diagnostics.size() == 1);
    const diagnostic& d = r.diagnostics[0];
    CHECK(d.level == severity::error);
    CHECK(d.rule == plumb::rules::inference_conflict);
    CHECK(d.message == "the formulas disagree about the dimension of 'X'");
    REQUIRE(d.notes.size() == 2);
    // Each note stands at its formula and says what the other one makes X.
    CHECK(r.source->position(d.notes[0].where.range.begin).line == 4);
    CHECK(d.notes[0].message == "@length: the other formulas make 'X' [T] (time)");
    CHECK(r.source->position(d.notes[1].where.range.begin).line == 5);
    CHECK(d.notes[1].message == "@time: the other formulas make 'X' [L] (length)");
}

TEST_CASE("inference: the one formula against the rest is the one named") {
    // Removing @b or @c alone leaves X = d against X = t; only removing @time settles it.
    const run r = infer("X, Z : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@b X = d\n"
                        "@c X = 2*d\n"
                        "@time X = t\n"
                        "@z Z = X*t\n");
    const auto conflicts = r.with_rule(plumb::rules::inference_conflict);
    REQUIRE(conflicts.size() == 1);
    REQUIRE(conflicts[0]->notes.size() == 1);
    CHECK(conflicts[0]->notes[0].message == "@time: the other formulas make 'X' [L] (length)");
    // Z hangs on X, about which the formulas disagree.
    CHECK(r.about("the dimension of 'Z' cannot be inferred").level == severity::warning);
}

TEST_CASE("inference: an unknown with a formula of its own is settled despite a dispute") {
    // Z = X*t leans on the disputed X, but @own fixes Z = [L T] without it.
    const run r = infer("X, Z : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@b X = d\n"
                        "@time X = t\n"
                        "@z Z = X*t\n"
                        "@own Z = d*t\n");
    CHECK(r.with_rule(plumb::rules::inference_conflict).size() == 1);
    const diagnostic& z = r.about("'Z'");
    CHECK(z.level == severity::note);
    CHECK(z.terms.at(0).dim == dim({{L, 1}, {T, 1}}));
}

TEST_CASE("inference: a disagreement no single formula settles names a minimal set") {
    // Two formulas say [L], two say [T]: removing any one leaves a disagreement. Dropping each
    // in turn while the rest still disagree leaves one of each: X = 3*d and X = 3*t.
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "X = d\n"
                        "X = 3*d\n"
                        "X = t\n"
                        "X = 3*t\n");
    REQUIRE(r.diagnostics.size() == 1);
    const diagnostic& d = r.diagnostics[0];
    CHECK(d.rule == plumb::rules::inference_conflict);
    REQUIRE(d.notes.size() == 3);
    CHECK(d.notes[0].message == "'X = 3*d' is one of the formulas that disagree");
    CHECK(r.source->position(d.notes[0].where.range.begin).line == 5);
    CHECK(d.notes[1].message == "'X = 3*t' is one of the formulas that disagree");
    CHECK(r.source->position(d.notes[1].where.range.begin).line == 7);
    CHECK(d.notes[2].message.starts_with("no one formula's removal settles it"));
}

TEST_CASE("inference: a formula that contradicts itself is said to") {
    // X + X*t needs X = [L] (from d) and X*t = [L] at once.
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@self X + X*t = d\n"
                        "@plain X = d\n");
    REQUIRE(r.diagnostics.size() == 1);
    REQUIRE(r.diagnostics[0].notes.size() == 1);
    CHECK(r.diagnostics[0].notes[0].message ==
          "@self cannot hold on its own, whatever dimensions its unknowns have");
}

TEST_CASE("inference: two separate disagreements in one tangle are both found") {
    // X and Y are tied by @tie; X disagrees in @x1/@x2 and Y in @y1/@y2. No single removal
    // settles both, so each round finds one set.
    const run r = infer("X, Y : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "@x1 X = d\n"
                        "@x2 X = t\n"
                        "@y1 Y = d\n"
                        "@y2 Y = t\n"
                        "@tie X*Y = d*t\n");
    CHECK(r.with_rule(plumb::rules::inference_conflict).size() == 2);
    CHECK(r.diagnostics.size() == 2);
}

TEST_CASE("inference: a disagreement without unknowns is left to the checker") {
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "t : s\n"
                        "X = d + t\n");
    // d + t is the checker's sum-mismatch; X still takes the first term's dimension.
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].level == severity::note);
    CHECK(r.diagnostics[0].terms.at(0).dim == dim({{L, 1}}));
}

TEST_CASE("inference: exponents beyond the exact range are reported, not thrown") {
    // 1/a + 1/b with a and b near 2^62 needs a denominator of about 2^124.
    const run r = infer("X : ?\n"
                        "d : m\n"
                        "X^(1/4611686018427387903) * X^(1/4611686018427387902) = d\n");
    CHECK(!r.with_rule(plumb::rules::overflow).empty());
    // X stands only in that formula, so nothing is left to fix it, and the warning says why.
    CHECK(has_note(r.about("the formulas leave the dimension of 'X' free"),
                   "exceeds the exact range"));
}

// ---- Coefficients of empirical formulas ----------------------------------------------------

TEST_CASE("inference: Manning's coefficient in US customary units") {
    // Chow, Open-Channel Hydraulics (1959), ch. 5 (from memory): V = (1.49/n) R^(2/3) S^(1/2)
    // in ft/s and ft, 1.486 to more figures; in SI, V = (1/n) R^(2/3) S^(1/2). The coefficient
    // carries [L T^-1] / [L^(2/3)] = [L^(1/3) T^-1]; in SI it is 1.486 * 0.3048 / 0.3048^(2/3)
    // = 1.486 * 0.3048^(1/3) = 1.486 * 0.672984 = 1.00005.
    const run r = infer("V : ft/s\n"
                        "R : ft\n"
                        "n, S : 1\n"
                        "@manning V = 1.486? / n * R^(2/3) * S^(1/2)\n");
    REQUIRE(r.diagnostics.size() == 1);
    const diagnostic& d = r.diagnostics[0];
    CHECK(d.level == severity::note);
    CHECK(d.rule == plumb::rules::inferred_dimension);
    CHECK(d.message == "the coefficient 1.486 must carry [L^(1/3) T^-1]");
    CHECK(r.source->text(d.where.range) == "1.486?");
    CHECK(d.terms.at(0).dim == dim({{L, rational(1, 3)}, {T, -1}}));
    CHECK(has_note(d, "1.486 holds only with V in ft/s and R in ft, as declared"));
    CHECK(has_note(d, "in coherent SI units the coefficient is 1.486 \u00D7 (ft/s)/ft^(2/3) = "
                      "1.486 \u00D7 0.3048^(1/3) = 1.00005"));
}

TEST_CASE("inference: Manning's coefficient in SI units is already coherent") {
    const run r = infer("V : m/s\n"
                        "R : m\n"
                        "n, S : 1\n"
                        "V = 1.0? / n * R^(2/3) * S^(1/2)\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 1.0 must carry [L^(1/3) T^-1]");
    CHECK(has_note(r.diagnostics[0], "the symbols are declared in coherent SI units"));
}

TEST_CASE("inference: Hazen-Williams' coefficient in US customary units") {
    // V = k C R^0.63 S^0.54: k carries [L T^-1] / [L^0.63] = [L^(37/100) T^-1]; in SI,
    // 1.318 * 0.3048^0.37 = 0.849182 (hand: ln 0.3048 = -1.18810, * 0.37 = -0.43960,
    // e^-0.43960 = 0.64430, * 1.318 = 0.84919).
    const run r = infer("V : ft/s\n"
                        "R : ft\n"
                        "C, S : 1\n"
                        "V = 1.318? * C * R^0.63 * S^0.54\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 1.318 must carry [L^(37/100) T^-1]");
    CHECK(has_note(r.diagnostics[0], "= 1.318 \u00D7 0.3048^(37/100) = 0.849182"));
}

TEST_CASE("inference: Darcy's law in oilfield units has a dimensionless coefficient") {
    // q = 0.001127 k A dp / (mu L), q in bbl/d, k in mD, A in ft^2, dp in psi, mu in cP, L in
    // ft. Dimensionless; in SI it is 0.001127 / 0.00112712 = 0.999897.
    const run r = infer("q : bbl/d\n"
                        "k : mD\n"
                        "A : ft^2\n"
                        "dp : psi\n"
                        "mu : cP\n"
                        "L : ft\n"
                        "q = 0.001127? * k * A * dp / (mu * L)\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 0.001127 must be dimensionless");
    CHECK(has_note(r.diagnostics[0], "0.001127 holds only with q in bbl/d, k in mD, A in ft^2, "
                                     "dp in psi, mu in cP and L in ft, as declared"));
    // ft^2 / ft leaves one foot below; the factors print to 7 figures, the result to 6.
    CHECK(has_note(r.diagnostics[0],
                   "in coherent SI units the coefficient is 0.001127 \u00D7 (bbl/d)*cP*ft/"
                   "(mD*ft^2*psi) = 0.001127 \u00D7 1.840131e-06*0.001/(9.869233e-16*0.3048*"
                   "6894.757) = 0.999897"));
}

TEST_CASE("inference: a coefficient written as a divisor is restated too") {
    // V = R^(2/3) S^(1/2) / (n k): k = 1/1.486 = 0.6729 carries [L^(-1/3) T]; in SI it is
    // 0.6729 / 0.3048^(1/3) = 0.6729 / 0.672984 = 0.999875.
    const run r = infer("V : ft/s\n"
                        "R : ft\n"
                        "n, S : 1\n"
                        "V = R^(2/3) * S^(1/2) / (n * 0.6729?)\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 0.6729 must carry [L^(-1/3) T]");
    CHECK(has_note(r.diagnostics[0], "= 0.6729 \u00D7 1/0.3048^(1/3) = 0.999875"));
}

TEST_CASE("inference: a coefficient in a formula of another shape is not restated") {
    const run r = infer("h, d : ft\n"
                        "h = 0.5? * d + d\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 0.5 must be dimensionless");
    CHECK(has_note(r.diagnostics[0], "is not of the form"));
}

TEST_CASE("inference: each coefficient is its own unknown") {
    // 2? carries [L] and 3? [L^2]; written alike or not, they are separate.
    const run r = infer("A : m^2\n"
                        "d : m\n"
                        "A = 2? * d\n"
                        "A = 3? + d*d\n");
    REQUIRE(r.diagnostics.size() == 2);
    CHECK(r.about("the coefficient 2 ").terms.at(0).dim == dim({{L, 1}}));
    CHECK(r.about("the coefficient 3 ").terms.at(0).dim == dim({{L, 2}}));
}

// ---- coherent_coefficient against published pairs ------------------------------------------

TEST_CASE("coherent coefficient: Manning, 1.486 US and 1 SI") {
    // Chow, Open-Channel Hydraulics (1959), ch. 5, from memory: 1.486 in ft-s units, 1 in SI.
    const std::vector<std::pair<double, rational>> us{{ft, rational(2, 3)}, {1.0, -1}};
    const double si = plumb::coherent_coefficient(1.486, ft, us);
    CHECK(rounds_to(si, 1.0, 3)); // 1.00005
    // And back: the SI coefficient 1 in US units is 1/0.3048^(1/3) = 1.48592.
    CHECK(rounds_to(1.0 / plumb::coherent_coefficient(1.0, ft, us), 1.486, 3));
}

TEST_CASE("coherent coefficient: Hazen-Williams, 1.318 US and 0.849 SI") {
    // V = k C R^0.63 S^0.54: 1.318 (ft, s) and 0.849 (m, s); e.g. Mays (ed.), Hydraulic Design
    // Handbook (1999), from memory.
    const std::vector<std::pair<double, rational>> us{{ft, rational(63, 100)}};
    CHECK(rounds_to(plumb::coherent_coefficient(1.318, ft, us), 0.849, 3));       // 0.849182
    CHECK(rounds_to(0.849 / plumb::coherent_coefficient(1.0, ft, us), 1.318, 3)); // 1.317717
}

TEST_CASE("coherent coefficient: Darcy's law in oilfield units, 0.001127 and 0.00708") {
    // Ahmed, Reservoir Engineering Handbook, ch. 6, from memory: linear flow q = 0.001127 k A
    // dp / (mu L) and radial flow q = 0.00708 k h dp / (mu ln(r_e/r_w)), in bbl/d, mD, ft,
    // psi, cP. In SI both laws have coefficient 1 (radial: 2*pi), so the oilfield coefficient
    // is 1 / (f_q / (f_k f_A f_dp) * f_mu * f_L) = 0.00112712.
    const std::vector<std::pair<double, rational>> oilfield{
        {millidarcy, 1}, {ft * ft, 1}, {psi, 1}, {cP, -1}, {ft, -1}};
    const double unit_factor = plumb::coherent_coefficient(1.0, bbl / day, oilfield);
    const double linear = 1.0 / unit_factor;
    CHECK(rounds_to(linear, 0.001127, 6));
    CHECK(rounds_to(2 * std::numbers::pi * linear, 0.00708, 5)); // 0.00708188
    // The published coefficient restated for SI is 1 to its four figures.
    CHECK(rounds_to(plumb::coherent_coefficient(0.001127, bbl / day, oilfield), 1.0, 3));
}

TEST_CASE("coherent coefficient: sharp-crested weir (Francis), 3.33 US and 1.84 SI") {
    // Francis formula for a rectangular sharp-crested weir, Q = C L H^(3/2): 3.33 in ft^3/s
    // and ft, 1.84 in m^3/s and m; e.g. Brater and King, Handbook of Hydraulics, from memory.
    const std::vector<std::pair<double, rational>> us{{ft, 1}, {ft, rational(3, 2)}};
    CHECK(rounds_to(plumb::coherent_coefficient(3.33, ft * ft * ft, us), 1.84, 2)); // 1.83845
    CHECK(rounds_to(1.84 / plumb::coherent_coefficient(1.0, ft * ft * ft, us), 3.33, 2));
}

TEST_CASE("inference: the Francis weir coefficient restated through a formula") {
    // 3.33 * 0.3048^3 / (0.3048 * 0.3048^(3/2)) = 3.33 * 0.3048^(1/2) = 1.83845.
    const run r = infer("Q : ft^3/s\n"
                        "b, H : ft\n"
                        "Q = 3.33? * b * H^(3/2)\n");
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics[0].message == "the coefficient 3.33 must carry [L^(1/2) T^-1]");
    // ft^3/s is 0.3048^3, so the derivation shows one power of 0.3048.
    CHECK(has_note(r.diagnostics[0], "in coherent SI units the coefficient is 3.33 \u00D7 "
                                     "(ft^3/s)/ft^(5/2) = 3.33 \u00D7 0.3048^(1/2) = 1.83845"));
}

// ---- Through the library's front door (needs session integration) ---------------------------

TEST_CASE("inference through check_text (needs session integration): Manning and a conflict") {
    const plumb::check_report report = plumb::check_text("infer.plumb", "V : ft/s\n"
                                                                        "R : ft\n"
                                                                        "n, S : 1\n"
                                                                        "X : ?\n"
                                                                        "d : m\n"
                                                                        "t : s\n"
                                                                        "V = 1.486? / n * "
                                                                        "R^(2/3) * S^(1/2)\n"
                                                                        "@a X = d\n"
                                                                        "@b X = t\n");
    bool manning = false;
    bool conflict = false;
    for (const auto& d : report.diagnostics) {
        if (d.rule == plumb::rules::inferred_dimension &&
            d.message == "the coefficient 1.486 must carry [L^(1/3) T^-1]")
            manning = true;
        if (d.rule == plumb::rules::inference_conflict &&
            d.message == "the formulas disagree about the dimension of 'X'" && d.notes.size() == 2)
            conflict = true;
    }
    CHECK(manning);
    CHECK(conflict);
    CHECK(report.count(severity::error) == 1);
}
