// Messages for what people type first: a product without '*', a quantity without braces,
// log with one argument, e^x, a limit written as a bare number, and an unknown unit whose
// note shows how to define that very unit. Each has a near miss that must stay quiet.
#include "notation/described_kind.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <algorithm>
#include <string>
#include <vector>

namespace {

// Declarations of the hydrostatic relation p = ρ g h (common practice).
const std::string hydrostatic = "p, p_0 : Pa\nρ : kg/m^3\ng : m/s^2\nh : m\nV : m/s\nx, y : 1\n";

const plumb::diagnostic* only(const plumb::check_report& r, std::string_view rule) {
    const plumb::diagnostic* found = nullptr;
    std::size_t count = 0;
    for (const auto& d : r.diagnostics)
        if (d.rule == rule) {
            found = &d;
            ++count;
        }
    return count == 1 ? found : nullptr;
}

bool any_note(const plumb::diagnostic& d, std::string_view text) {
    for (const auto& n : d.notes)
        if (n.message.find(text) != std::string::npos)
            return true;
    return false;
}

} // namespace

TEST_CASE("'ρ g h' without operators: a product needs '*'") {
    const auto r = plumb::check_text("h.plumb", hydrostatic + "p = ρ g h\n");
    const plumb::diagnostic* d = only(r, plumb::rules::syntax);
    REQUIRE(d != nullptr);
    CHECK(d->message.find("needs '*'") != std::string::npos);
    CHECK(d->message.find("ρ*g") != std::string::npos);
    const auto fixed = plumb::check_text("h.plumb", hydrostatic + "p = ρ*g*h\nV >= 0\nx = y\n"
                                                                  "p_0 >= 0\n");
    CHECK(fixed.diagnostics.empty());
}

TEST_CASE("'101.325 kPa' in a formula: the unit goes in braces") {
    const auto r = plumb::check_text("h.plumb", hydrostatic + "p = p_0 + 101.325 kPa\n");
    const plumb::diagnostic* d = only(r, plumb::rules::syntax);
    REQUIRE(d != nullptr);
    CHECK(d->message.find("write 101.325 {kPa}") != std::string::npos);
    const auto compound = plumb::check_text("h.plumb", hydrostatic + "g = 9.81 m/s^2\n");
    REQUIRE(only(compound, plumb::rules::syntax) != nullptr);
    CHECK(only(compound, plumb::rules::syntax)->message.find("write 9.81 {m/s^2}") !=
          std::string::npos);
    // A number next to a word that is no unit is a product without '*', not a quantity.
    const auto not_unit = plumb::check_text("h.plumb", hydrostatic + "p = 2 ρ\n");
    REQUIRE(only(not_unit, plumb::rules::syntax) != nullptr);
    CHECK(only(not_unit, plumb::rules::syntax)->message.find("braces") == std::string::npos);
}

TEST_CASE("log with one argument: ln, log10 or log(x, base)") {
    const auto r = plumb::check_text("h.plumb", hydrostatic + "y = log(x)\n");
    const plumb::diagnostic* d = only(r, plumb::rules::wrong_arity);
    REQUIRE(d != nullptr);
    CHECK(any_note(*d, "ln(x)"));
    CHECK(any_note(*d, "log10(x)"));
    const auto two = plumb::check_text("h.plumb", hydrostatic + "y = log(x, 10)\n");
    CHECK(only(two, plumb::rules::wrong_arity) == nullptr);
}

TEST_CASE("e^x: write exp(x)") {
    const auto r = plumb::check_text("h.plumb", hydrostatic + "y = e^x\n");
    const plumb::diagnostic* d = only(r, plumb::rules::undeclared);
    REQUIRE(d != nullptr);
    CHECK(any_note(*d, "exp(x)"));
    const auto other = plumb::check_text("h.plumb", hydrostatic + "y = f^x\n");
    REQUIRE(only(other, plumb::rules::undeclared) != nullptr);
    CHECK_FALSE(any_note(*only(other, plumb::rules::undeclared), "exp(x)"));
}

TEST_CASE("a limit typed as a bare number: give it the other side's unit") {
    const auto r = plumb::check_text("h.plumb", hydrostatic + "V <= 7.5\n");
    const plumb::diagnostic* d = only(r, plumb::rules::side_mismatch);
    REQUIRE(d != nullptr);
    CHECK(any_note(*d, "7.5 {m/s}"));
    const auto fixed = plumb::check_text("h.plumb", hydrostatic + "V <= 7.5 {m/s}\n");
    CHECK(only(fixed, plumb::rules::side_mismatch) == nullptr);
}

TEST_CASE("an unknown unit's note shows how to define that very unit") {
    const auto r = plumb::check_text("h.plumb", "Q : Mgald\n");
    const plumb::diagnostic* d = only(r, plumb::rules::unknown_unit);
    REQUIRE(d != nullptr);
    CHECK(any_note(*d, "measure Mgald = <size> <known unit>"));
    // A pressure with a trailing g is offered the gauge form.
    const auto gauge = plumb::check_text("h.plumb", "p : GPag\n");
    REQUIRE(only(gauge, plumb::rules::unknown_unit) != nullptr);
    CHECK(any_note(*only(gauge, plumb::rules::unknown_unit),
                   "measure GPag = GPa zero at 101.325 kPa"));
    // The nearest spelling is offered first: "MGD" is a change of case from "mgd" (common
    // practice: million gallons a day), not the millidarcy.
    const auto flow = plumb::check_text("h.plumb", "Q : mgdd\n");
    REQUIRE(only(flow, plumb::rules::unknown_unit) != nullptr);
    CHECK(only(flow, plumb::rules::unknown_unit)->message.find("did you mean 'mgd'") !=
          std::string::npos);
}

// The fan and duct trades write inches of water gauge or column ("in. w.g.", "in. w.c.");
// the table's inch of water is inH2O (conventional, 249.08891 Pa; NIST SP 811 (2008), B.8).
// The nearest spelling, inHg, is the inch of mercury, 13.6 times larger: offered no longer.
TEST_CASE("inches of water gauge typed the trade's way are offered inH2O") {
    for (const char* unit : {"in_wg", "inWG", "inwc", "in_WC"}) {
        CAPTURE(unit);
        const auto r = plumb::check_text("h.plumb", fmt::format("Δp : {}\n", unit));
        REQUIRE(only(r, plumb::rules::unknown_unit) != nullptr);
        const std::string& message = only(r, plumb::rules::unknown_unit)->message;
        CHECK(message.find("the inch of water is written inH2O") != std::string::npos);
        CHECK(message.find("inHg") == std::string::npos);
    }
}

// Normal and standard cubic metres are units of their own (DIN 1343's 0 °C and 101.325 kPa,
// ISO 13443's 15 °C, from memory), spelled whole: "Nm^3" powers an unknown "Nm".
TEST_CASE("a gas volume at reference conditions written with a power is offered whole") {
    for (const char* unit : {"Nm", "Sm"}) {
        CAPTURE(unit);
        const auto r = plumb::check_text("h.plumb", fmt::format("c : g/{}^3\n", unit));
        REQUIRE(only(r, plumb::rules::unknown_unit) != nullptr);
        CHECK(only(r, plumb::rules::unknown_unit)
                  ->message.find(fmt::format("did you mean '{}3'? It is written whole", unit)) !=
              std::string::npos);
    }
    const auto whole = plumb::check_text("h.plumb", "c : g/Nm3\nd : g/Nm\u00B3\n");
    CHECK(std::none_of(whole.diagnostics.begin(), whole.diagnostics.end(),
                       [](const auto& d) { return d.rule == plumb::rules::unknown_unit; }));
}

TEST_CASE("suggestions for an unknown unit prefer units of the kind the description names") {
    // mgd, million US gallons a day, is a volumetric flow; md, the millidarcy, a permeability
    // (an area) (common practice in water works and in petroleum engineering respectively).
    const auto first_suggestion = [](const std::string& text) {
        const auto r = plumb::check_text("h.plumb", text);
        const plumb::diagnostic* d = only(r, plumb::rules::unknown_unit);
        REQUIRE(d != nullptr);
        const auto at = d->message.find("did you mean '");
        REQUIRE(at != std::string::npos);
        const auto begin = at + 14;
        return d->message.substr(begin, d->message.find('\'', begin) - begin);
    };
    // Without a description the nearest spelling wins: "mdg" is one letter from "md".
    CHECK(first_suggestion("Q : mdg\n") == "md");
    // A flow: the flow unit first, though it is further in spelling.
    CHECK(first_suggestion("Q : mdg \"average daily flow\"\n") == "mgd");
    CHECK(first_suggestion("Q : mGD \"influent flow\"\n") == "mgd");
    // A permeability: the millidarcy first.
    CHECK(first_suggestion("k : mGD \"rock permeability\"\n") == "mD");
    // A mass flow is not a volume flow: "mass flow" names its own kind.
    CHECK(first_suggestion("m : mdg \"mass flow of sludge\"\n") != "mgd");
    // A symbol typed in another case is offered, however long ("MGD" for "mgd").
    CHECK(first_suggestion("Q : MGD \"plant flow\"\n") == "mgd");
}

TEST_CASE("described_kind reads the kind of quantity a description names") {
    using plumb::described_kind;
    const auto flow = described_kind("Average daily FLOW");
    REQUIRE(flow);
    CHECK(flow->to_string() == "[L^3 T^-1]");
    REQUIRE(described_kind("mass flow of sludge"));
    CHECK(described_kind("mass flow of sludge")->to_string() == "[M T^-1]");
    CHECK(described_kind("pipe diameters")->to_string() == "[L]");
    CHECK_FALSE(described_kind("overflow weir")); // "flow" inside a word is not the word
    CHECK_FALSE(described_kind("flow velocity")); // two kinds: no preference
    CHECK_FALSE(described_kind("a coefficient"));
}
