// Units as people type them: digits and superscripts as powers, a space or a middle dot as a
// product, the gauge and absolute marks, the lone degree sign. Each typed form is checked
// against the same unit written with '^' and '*': a formula equating the two must pass with
// no finding at all (a wrong dimension or a wrong scale would be reported), and against a
// unit of another scale, which must be reported.
#include "plumb/check.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <string>
#include <vector>

namespace {

std::vector<const plumb::diagnostic*> findings(const plumb::check_report& r,
                                               std::string_view rule) {
    std::vector<const plumb::diagnostic*> out;
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            out.push_back(&d);
    return out;
}

std::string listing(const plumb::check_report& r) {
    std::string out;
    for (const auto& d : r.diagnostics)
        out += d.rule + ": " + d.message + "\n";
    return out;
}

// `typed` and `written` must mean the same unit: equating them finds nothing.
void same_unit(const std::string& typed, const std::string& written) {
    CAPTURE(typed);
    const auto r = plumb::check_text("u.plumb", "a : " + typed + "\nb : " + written + "\na = b\n");
    INFO(listing(r));
    CHECK(r.diagnostics.empty());
}

// `typed` and `other` have one dimension and different scales: reported as unit-scale.
void other_scale(const std::string& typed, const std::string& other) {
    CAPTURE(typed);
    const auto r = plumb::check_text("u.plumb", "a : " + typed + "\nb : " + other + "\na = b\n");
    INFO(listing(r));
    CHECK(findings(r, plumb::rules::unit_scale).size() == 1);
    CHECK(r.count(plumb::severity::error) == 0);
}

} // namespace

TEST_CASE("a digit after a unit symbol is its power (common practice: m3, kg/m3, mm4)") {
    same_unit("m3", "m^3");
    same_unit("m3/h", "m^3/h");
    same_unit("kg/m3", "kg/m^3");
    same_unit("mm4", "mm^4");
    same_unit("cm2", "cm^2");
    same_unit("in4", "in^4");
    same_unit("W/m2", "W/m^2");
    // A row that ends in a digit is read as written: the cubic foot, the inch of water.
    same_unit("ft3", "ft^3");
    other_scale("inH2O", "Pa");
    // Not the metre: m3/h is a flow, and m3/s is 3600 times m3/h.
    other_scale("m3/h", "m^3/s");
    const auto r = plumb::check_text("u.plumb", "a : m3/h\nb : m/h\na = b\n");
    CHECK(findings(r, plumb::rules::side_mismatch).size() == 1);
}

TEST_CASE("'1/s' and '(1/2)' exponents still read as before") {
    same_unit("1/s", "s^-1");
    same_unit("m^(1/2)", "m^0.5");
    same_unit("Hz", "1/s");
}

TEST_CASE("superscript exponents, as documents print them") {
    same_unit("m\u00B2", "m^2");
    same_unit("m\u00B3", "m^3");
    same_unit("m/s\u00B2", "m/s^2");
    same_unit("s\u207B\u00B9", "s^-1");
    same_unit("kg/m\u00B3", "kg/m^3");
    same_unit("W/(m\u00B2\u00B7K)", "W/(m^2*K)");
    same_unit("mm\u2074", "mm^4");
    other_scale("m\u00B3/h", "m^3/s");
}

TEST_CASE("a space or a middle dot multiplies units") {
    same_unit("kN m", "kN*m");
    same_unit("kN\u00B7m", "kN*m");
    same_unit("W/(m^2 K)", "W/(m^2*K)");
    same_unit("W/(m2 K)", "W/(m^2*K)");
    same_unit("Pa s", "Pa*s");
    same_unit("N m/s", "N*m/s");
    other_scale("kN m", "N*m");
}

TEST_CASE("nothing after a unit is eaten: '=', a description, 'zero at', a comment") {
    const auto r =
        plumb::check_text("u.plumb", "M : kN m \"bending moment\"\n"
                                     "M_0 : kN m = 12.5 \"moment at the support\"\n"
                                     "k : W/(m^2 K)   # film coefficient\n"
                                     "measure kPa_gauge = kPa zero at 101.325 kPa \"gauge\"\n"
                                     "p : kPa_gauge\n"
                                     "p_1 : kPag\n"
                                     "M <= M_0\n"
                                     "k >= 0\n"
                                     "p = p_1\n");
    INFO(listing(r));
    CHECK(r.diagnostics.empty());
}

TEST_CASE("gauge and absolute marks: kPa(g), psi(g), kPa(a) (common practice)") {
    same_unit("kPa(g)", "kPag");
    same_unit("psi(g)", "psig");
    same_unit("bar(g)", "barg");
    same_unit("kPa(a)", "kPa");
    same_unit("psi(a)", "psia");
    // A gauge value in a product is an offset-scale error, as psig is.
    const auto r = plumb::check_text("u.plumb", "p : kPa(g)\nV : m^3\nW : J\nW = p*V\n");
    CHECK(findings(r, plumb::rules::offset_scale).size() == 1);

    SUBCASE("a mark on a unit that is no pressure, or has no gauge row, says so") {
        const auto m = plumb::check_text("u.plumb", "x : m(g)\n");
        REQUIRE(findings(m, plumb::rules::unknown_unit).size() == 1);
        CHECK(findings(m, plumb::rules::unknown_unit)[0]->message.find(
                  "not an absolute pressure") != std::string::npos);
        const auto gpa = plumb::check_text("u.plumb", "x : GPa(g)\n");
        REQUIRE(findings(gpa, plumb::rules::unknown_unit).size() == 1);
        CHECK(findings(gpa, plumb::rules::unknown_unit)[0]->message.find(
                  "measure GPag = GPa zero at 101.325 kPa") != std::string::npos);
    }
    SUBCASE("the gas and vessel trades' gauge units are built in (common practice)") {
        same_unit("MPa(g)", "MPag");
        same_unit("mbar g", "mbarg");
        same_unit("inH2O(g)", "inH2Og");
        // A file that defined them itself, as before they were built in, still reads.
        const auto own = plumb::check_text(
            "u.plumb",
            "measure mbarg = mbar zero at 101.325 kPa\n"
            "measure inH2Og = inH2O zero at 1013.25 mbar\np : mbarg\nq : mbar g\np = q\n");
        INFO(listing(own));
        CHECK(own.diagnostics.empty());
        // One with another zero is a conflict, as before.
        const auto other = plumb::check_text("u.plumb", "measure mbarg = mbar zero at 95 kPa\n");
        CHECK(findings(other, plumb::rules::conflicting_declaration).size() == 1);
    }
}

TEST_CASE("gauge and absolute marks after a space: kPa g, bar a, kPa abs (common practice)") {
    // Nameplates and sheets print "7 bar g" and "101.3 kPa abs"; read as a product, "kPa g"
    // would be kilopascal times gram.
    same_unit("kPa g", "kPag");
    same_unit("bar g", "barg");
    same_unit("psi g", "psig");
    same_unit("bar a", "bar");
    same_unit("kPa abs", "kPa");
    other_scale("bar g", "psig");
    // Gauge set equal to absolute: the zeros differ.
    const auto zeros = plumb::check_text("u.plumb", "a : bar g\nb : bar a\na = b\n");
    CHECK(findings(zeros, plumb::rules::offset_scale).size() == 1);
    // With a description, a constant or a comment after it, and inside a quantity's braces.
    const auto described = plumb::check_text(
        "u.plumb", "p : kPa g \"discharge\"\nq : kPa g = 300 # relief set\nr : kPag\n"
                   "p = r + 50 {kPa g} - q\n");
    INFO(listing(described));
    CHECK(described.diagnostics.empty());
    // A gas law on gauge readings declared so is the offset-scale error it is with psig.
    const auto gas_law =
        plumb::check_text("u.plumb", "p_1, p_2 : bar g\nV_1, V_2 : m^3\np_1*V_1 = p_2*V_2\n");
    const auto gas_law_psig =
        plumb::check_text("u.plumb", "p_1, p_2 : psig\nV_1, V_2 : m^3\np_1*V_1 = p_2*V_2\n");
    CHECK(findings(gas_law, plumb::rules::offset_scale).size() == 2); // one on each side
    CHECK(findings(gas_law_psig, plumb::rules::offset_scale).size() == 2);
    // A lone g that is no mark stays the gram: after a unit that is no pressure it is refused
    // as a mark, and inside a product it is the gram as before.
    const auto not_pressure = plumb::check_text("u.plumb", "x : kN g\n");
    REQUIRE(findings(not_pressure, plumb::rules::unknown_unit).size() == 1);
    CHECK(findings(not_pressure, plumb::rules::unknown_unit)[0]->message.find(
              "not an absolute pressure") != std::string::npos);
    same_unit("kg m", "kg*m");
    same_unit("g m/s", "g*m/s");
}

TEST_CASE("the year of annual energy and emissions: yr and a, 365 days (NIST SP 811 (2008), B.8)") {
    same_unit("kWh/yr", "kWh/a");
    other_scale("kWh/yr", "kWh/d");
    const auto days = plumb::check_text(
        "u.plumb", "measure year365 = 365 d\nE : kWh/yr\nF : kWh/year365\nE = F\n");
    INFO(listing(days));
    CHECK(days.diagnostics.empty());
    // A file that defined it itself, at 365 days, still reads.
    const auto own =
        plumb::check_text("u.plumb", "measure yr = 365 d\nE : MWh/yr\nF : MWh/a\nE = F\n");
    INFO(listing(own));
    CHECK(own.diagnostics.empty());
}

TEST_CASE("deg C and deg F are the temperature scales; C for a temperature is refused") {
    // Typed where the keyboard lacks ° (common practice); as a product they would be an angle
    // times a coulomb or a farad.
    same_unit("deg C", "\u00B0C");
    same_unit("deg F", "\u00B0F");
    const auto multiplied =
        plumb::check_text("u.plumb", "T : deg C\nm : kg\nc : J/(kg*K)\nQ : J\nQ = m*c*T\n");
    CHECK(findings(multiplied, plumb::rules::offset_scale).size() == 1);
    // SI Brochure 9th ed., Table 4: C is the coulomb, F the farad. A temperature declared in
    // them would multiply unseen, so the description's word decides.
    const auto as_charge = plumb::check_text(
        "u.plumb", "T_s : C \"supply temperature\"\nc : J/(kg*C) \"specific heat\"\n");
    CHECK(findings(as_charge, plumb::rules::unknown_unit).size() == 2);
    const auto charge =
        plumb::check_text("u.plumb", "q : C \"charge through the cell\"\nC_b : F \"capacitance\"\n"
                                     "I : A\nt : s\nq = I*t\nV : V\nq = C_b*V\n");
    INFO(listing(charge));
    CHECK(charge.diagnostics.empty());
}

TEST_CASE("the degree sign alone is the angle degree (SI Brochure 9th ed., Table 8)") {
    same_unit("\u00B0", "deg");
    same_unit("\u00B0/s", "deg/s");
    other_scale("\u00B0", "rad");
    // °C and °F are still the temperature scales.
    const auto r = plumb::check_text("u.plumb", "T : \u00B0C\nθ : \u00B0\nT = θ\n");
    CHECK(findings(r, plumb::rules::side_mismatch).size() == 1);
    // "° C" would read as degree times coulomb; it is refused with a message instead.
    const auto spaced = plumb::check_text("u.plumb", "T : \u00B0 C\n");
    REQUIRE(findings(spaced, plumb::rules::syntax).size() == 1);
    CHECK(findings(spaced, plumb::rules::syntax)[0]->message.find("without a space") !=
          std::string::npos);
}

TEST_CASE("rotational speed: rpm, r/min, rev/s, one revolution counted as one cycle (common "
          "practice)") {
    same_unit("rpm", "r/min");
    same_unit("rpm", "rev/min");
    same_unit("rev/s", "Hz");
    same_unit("r/min", "1/min");
    other_scale("rpm", "rev/s");
    // Synchronous speed n = 60 f / P with P pole pairs (common practice): with n in rpm and
    // f in Hz the 60 is exactly the factor between the units, so nothing is reported.
    const auto r = plumb::check_text("u.plumb", "n : rpm\nf : Hz\nP : 1\nn = 60*f/P\n");
    INFO(listing(r));
    CHECK(r.diagnostics.empty());
}

TEST_CASE("--restate-in accepts a set that takes force as a base: ft, lbf, s") {
    // Water at 1000 kg/m^3 is 1.940 slug/ft^3 and 62.43 lb/ft^3 (common practice, from
    // memory); the slug is lbf·s²/ft (NIST SP 811 (2008), B.8).
    const std::string calc = "ρ_w : kg/m^3\nρ_w = 1000?\n";
    const auto restated = [&](std::vector<std::string> set) {
        plumb::check_options options;
        options.restate_in = std::move(set);
        const auto r = plumb::check_text("r.plumb", calc, options);
        std::string notes;
        for (const auto* d : findings(r, plumb::rules::inferred_dimension))
            for (const auto& n : d->notes)
                notes += n.message + "\n";
        return notes;
    };
    const std::string force_based = restated({"ft", "lbf", "s"});
    CHECK(force_based.find("in coherent units of ft, lbf, s the coefficient is") !=
          std::string::npos);
    CHECK(force_based.find("= 1.94") != std::string::npos);
    const std::string mass_based = restated({"ft", "lb", "s"});
    CHECK(mass_based.find("= 62.4") != std::string::npos);

    CHECK_FALSE(plumb::restate_units_problem({"ft", "lbf", "s"}).has_value());
    CHECK_FALSE(plumb::restate_units_problem({"m", "N", "s"}).has_value());
    CHECK_FALSE(plumb::restate_units_problem({"ft", "s"}).has_value());
    // One unit short, one too many, or two that follow from each other: refused, with why.
    CHECK(plumb::restate_units_problem({"lbf"}).has_value());
    CHECK(plumb::restate_units_problem({"ft", "lbf", "s", "lb"}).has_value());
    CHECK(plumb::restate_units_problem({"ft", "ft2"}).has_value());
    CHECK(plumb::restate_units_problem({"furlong"}).has_value());
    CHECK(plumb::restate_units_problem({"\u00B0C"}).has_value());
}

// Gas trades size by volume at reference conditions: the normal cubic metre at 0 °C and
// 101.325 kPa (DIN 1343, from memory) and the standard one at 15 °C (ISO 13443, from memory),
// each a volume, as the oilfield's scf is. "Nm" alone is no unit (N·m is written "N m").
TEST_CASE("normal and standard cubic metres are units, and a file may say so again") {
    const auto clean = plumb::check_text(
        "g.plumb", "measure Nm3 = m^3 \"normal cubic metre\"\nV_n : Nm3\nQ_n : Nm3/h\n"
                   "Q_s : Nm3/d\nt : h\n@a V_n = Q_n*t\n@b Q_s = Q_n*24\n");
    CHECK(clean.diagnostics.empty());
    const auto resized =
        plumb::check_text("g.plumb", "measure Nm3 = 1.1 m^3\nV_n : Nm3\n@a V_n = V_n\n");
    REQUIRE(resized.diagnostics.size() == 1);
    CHECK(resized.diagnostics[0].rule == plumb::rules::conflicting_declaration);
    const auto torque = plumb::check_text("g.plumb", "M : Nm\n@a M = M\n");
    REQUIRE_FALSE(torque.diagnostics.empty());
    CHECK(torque.diagnostics[0].rule == plumb::rules::unknown_unit);
}
