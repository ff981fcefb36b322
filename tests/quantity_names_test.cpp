// Conventional names of dimensions. The dimensions are typed or built with the dimension
// algebra; the expected names are the ones engineers search diagnostics for.
#include "plumb/dimension.hpp"
#include "plumb/unit_table.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <string>
#include <string_view>
#include <utility>

using plumb::base_dimension;
using plumb::dimension;
using plumb::quantity_name;
using plumb::rational;

namespace {

using plumb::test::typed;

bool mentions(std::string_view name, std::string_view word) {
    return name.find(word) != std::string_view::npos;
}

const dimension M = dimension::base(base_dimension::mass);
const dimension L = dimension::base(base_dimension::length);
const dimension T = dimension::base(base_dimension::time);
const dimension K = dimension::base(base_dimension::temperature);

} // namespace

TEST_CASE("the quantities engineers look for have names") {
    const dimension force = M * L / T.pow(2);
    CHECK(quantity_name(force) == "force");
    CHECK(quantity_name(force / L.pow(2)) == "pressure or stress");
    CHECK(quantity_name(force / L.pow(2) * T) == "dynamic viscosity");
    CHECK(quantity_name(force * L / T) == "power");
    CHECK(quantity_name(L / T) == "velocity");
    CHECK(quantity_name(L / T.pow(2)) == "acceleration");
    CHECK(quantity_name(M / L.pow(3)) == "density");
    CHECK(quantity_name(L.pow(3) / T) == "volumetric flow rate");
    CHECK(quantity_name(M / T) == "mass flow rate");
    CHECK(quantity_name(L.pow(2) / T) == "kinematic viscosity or diffusivity");

    // Energy and torque share [M L^2 T^-2]; the name must say both.
    const std::string_view work = quantity_name(force * L);
    CHECK(mentions(work, "energy"));
    CHECK(mentions(work, "torque"));

    const dimension power = force * L / T;
    CHECK(quantity_name(power / (L * K)) == "thermal conductivity");
    CHECK(quantity_name(power / (L.pow(2) * K)) == "heat transfer coefficient");
    CHECK(quantity_name(power / L.pow(2)) == "heat flux or irradiance");
    CHECK(mentions(quantity_name(force * L / (M * K)), "specific heat capacity"));
    CHECK(mentions(quantity_name(force / L), "surface tension"));
    CHECK(mentions(quantity_name(dimension{} / T), "frequency"));
    CHECK(quantity_name(L) == "length");
    CHECK(quantity_name(L.pow(2)) == "area");
    CHECK(quantity_name(L.pow(3)) == "volume");
}

TEST_CASE("SI derived units get their quantity's name (SI Brochure 9th ed., Table 4)") {
    const auto& table = plumb::unit_table::standard();
    const std::pair<std::string_view, std::string_view> expected[] = {
        {"V", "voltage"},      {"\u03A9", "resistance"}, {"C", "charge"},
        {"F", "capacitance"},  {"H", "inductance"},      {"Wb", "magnetic flux"},
        {"T", "flux density"}, {"S", "conductance"},     {"lx", "illuminance"},
        {"kat", "catalytic"},  {"Gy", "absorbed dose"},  {"Hz", "frequency"},
    };
    for (const auto& symbol_and_word : expected) {
        const std::string symbol(symbol_and_word.first);
        CAPTURE(symbol);
        const auto unit = table.resolve(symbol);
        REQUIRE(unit.has_value());
        CHECK(mentions(quantity_name(unit->dim()), symbol_and_word.second));
    }
}

TEST_CASE("dimensionless and unnamed dimensions") {
    CHECK(quantity_name(dimension{}) == "dimensionless");
    CHECK(quantity_name(L / L) == "dimensionless");
    CHECK(quantity_name(typed(3, 7, 0)).empty());
    CHECK(quantity_name(typed(1, 1, 1, 1, 1, 1, 1)).empty());
    CHECK(quantity_name(L.pow(rational(1, 2))).empty());
    CHECK(quantity_name(L.pow(100)).empty());
    // An exponent that a narrowing cast would wrap onto a named one (256 + 1 → 1).
    CHECK(quantity_name(L.pow(257)).empty());
}
