#include "check/gravity_number.hpp"

#include "check/trade_constants.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>
#include <cstdlib>
#include <exception>
#include <fmt/format.h>
#include <tuple>

namespace plumb {
namespace {

// 3rd CGPM (1901): g_n = 9.80665 m/s², exact by definition (SI Brochure 9th ed.).
constexpr double standard_gravity = 9.80665;
constexpr double closest_reading = 0.005;
// The factors a calc leaves out beside a property it types as a number, besides the powers of
// ten: the minute, the hour and the day in seconds (SI Brochure 9th ed., Table 8), and the
// 7000 grains of a pound (NIST SP 811 (2008), B.8) of the air trade's humidity ratios.
struct factor_left_out {
    double factor;
    unsigned units; // the clock_unit bits, any of which allows it
};
constexpr std::array<factor_left_out, 4> unit_factors_left_out{{{60.0, clock_minute | clock_hour},
                                                                {3600.0, clock_hour},
                                                                {86400.0, clock_day},
                                                                {7000.0, clock_grain}}};
// The other numbers of the term may convert units (a /1000 to kPa); every subset of them is
// tried, so the count is kept small.
constexpr std::size_t most_numbers = 8;

// Rows of the table below that rules ask for by name.
constexpr std::size_t twice_gravity_row = 1;
constexpr std::size_t round_water_row = 3; // the ground engineer's 10 kN/m³
constexpr std::size_t molar_volume_row = 7;
constexpr std::size_t year_row = 16; // the hours of a year
constexpr std::size_t day_row = 19;  // the hours of a day

const dimension& density_dimension() {
    static const dimension density = dimension::base(base_dimension::mass) /
                                     dimension::base(base_dimension::length).pow(rational(3));
    return density;
}

const std::array<carried_quantity, 41>& quantities() {
    static const std::array<carried_quantity, 41> table = [] {
        const dimension mass = dimension::base(base_dimension::mass);
        const dimension length = dimension::base(base_dimension::length);
        const dimension time = dimension::base(base_dimension::time);
        const dimension temperature = dimension::base(base_dimension::temperature);
        const dimension acceleration = length / time / time;
        const dimension density = mass / (length * length * length);
        const dimension specific_heat = length * length / (time * time) / temperature;
        // kg/L to kg/m³ times g_n: γ_w over water's densities from 0 to 30 °C.
        const double water_least = water_density_least().to_double() * 1000.0;
        const double water_greatest = water_density_greatest().to_double() * 1000.0;
        // Water's c_p falls from 4219.9 J/(kg·K) at 0 °C to 4180.1 at 30 °C (IAPWS-95 values as
        // tabulated in the CRC Handbook; from memory): ρ·c_p from 995.65 × 4180.1 at 30 °C to
        // 999.84 × 4219.9 at 0 °C.
        const double water_heat_least = 995.65 * 4180.1;
        const double water_heat_greatest = 999.84 * 4219.9;
        // Dry air at 101.325 kPa between 0 and 40 °C: ρ = p·M/(R·T) with M = 28.9647 g/mol
        // (common practice) and R = 8.314462618 J/(mol·K) (CODATA 2018), times c_p from 1.005
        // to 1.007 kJ/(kg·K) (from memory).
        const auto air_density = [](double celsius) {
            return 101325.0 * 0.0289647 / (8.314462618 * (celsius + 273.15));
        };
        // A gas's specific gas constant typed as a number, in J/(kg·K).
        const auto gas_constant = [&](std::string_view what, std::string_view symbol,
                                      std::string_view reciprocal, std::string_view advice,
                                      double least, double greatest) {
            return carried_quantity{
                rules::trade_constant,
                what,
                symbol,
                reciprocal,
                "",
                advice,
                "write the gas constant in a cell that holds its unit to say so",
                specific_heat,
                least,
                greatest};
        };
        const double air_at_normal_state = 1.2930;
        const double air_heat_least = air_density(40.0) * 1005.0;
        const double air_heat_greatest = air_density(0.0) * 1007.0;
        // An ideal gas's molar volume V_m = R·T/p at 101.325 kPa from 0 to 25 °C (R = 8.314462618
        // J/(mol·K), CODATA 2018): 22.414 to 24.465 L/mol, the trade's 22.4, 24.45, 379.5 and
        // 385.3 scf/lbmol among them (common practice).
        const double molar_volume_least = 8.314462618 * 273.15 / 101325.0;
        const double molar_volume_greatest = 8.314462618 * 298.15 / 101325.0;
        const dimension amount = dimension::base(base_dimension::amount);
        // The moisture a volume of air carries, as latent heat: ρ_a times water's latent heat
        // from 2406 kJ/kg at 40 °C to 2501 at 0 °C (steam tables, from memory) and the air
        // trade's 1076 Btu/lb (2502.8 kJ/kg, common practice), inside its 0.68 and 4840.
        const double air_latent_least = air_density(40.0) * 2406.0e3;
        const double air_latent_greatest = air_density(0.0) * 2503.0e3;
        return std::array<carried_quantity, 41>{{
            {rules::gravity_number, "standard gravity", "g_n = 9.80665 m/s\u00B2", "1/g_n", "",
             "write {g_n} instead to say so, or declare local gravity with its unit "
             "(g_site : m/s^2) where it differs",
             "write 9.80665 or a cell that holds g with its unit to say so", acceleration,
             standard_gravity, standard_gravity, carried_quantity::term_kind::any, "{g_n}"},
            // The braking distance d = V²/(254*(f + G)) in m from km/h (254 = 2·g·3.6²) and
            // V²/(30*(f + G)) in ft from mph (AASHTO, from memory): twice g, the 2g of v²/(2g).
            {rules::gravity_number, "twice standard gravity", "2\u00B7g_n", "1/(2\u00B7g_n)", "",
             "write 2*{g_n} instead to say so", "write 2*9.80665 or a cell that holds g to say so",
             acceleration, 2.0 * standard_gravity, 2.0 * standard_gravity,
             carried_quantity::term_kind::any, "2*{g_n}"},
            // Up to 1000 × 9.81 = 9810 N/m³, the trade's round figures (common practice): the
            // 2.725 kWh/ML per metre of a pumping energy is 1000·9.81/3600.
            {rules::gravity_number, "the specific weight of water", "\u03B3_w = \u03C1_w\u00B7g_n",
             "1/\u03B3_w",
             " (water between 0 and 30 \u00B0C, \u03C1_w from 995.65 to 999.975 kg/m\u00B3; "
             "1000 \u00D7 9.81 as the trade rounds it)",
             "write \u03C1_w*{g_n}, with \u03C1_w declared for the water's temperature, to say "
             "so; for another liquid the specific gravity must multiply \u03C1_w",
             "write the density and g in cells that hold their units to say so; for another "
             "liquid the specific gravity must multiply the density",
             density * acceleration, water_least * standard_gravity, 1000.0 * 9.81},
            // Ground engineers round water's unit weight to 10 kN/m³ (EN 1997-1 worked
            // examples, common practice): γ' = γ_sat - 10. Only that round 10, in kN/m³, 2 %
            // above ρ_w·g_n; never a 10 for g.
            {rules::gravity_number, "the unit weight of water rounded to 10 kN/m\u00B3",
             "\u03B3_w \u2248 10 kN/m\u00B3", "1/\u03B3_w",
             " (geotechnical practice; \u03C1_w\u00B7g_n is 9.81 kN/m\u00B3, 2 % less)",
             "write \u03B3_w : kN/m^3 = 10 as a declared constant to say so",
             "write the unit weight of water in a cell that holds its unit to say so",
             density * acceleration, 10.0e3, 10.0e3},
            {rules::trade_constant, "the heat capacity of a volume of water", "\u03C1_w\u00B7c_p,w",
             "1/(\u03C1_w\u00B7c_p,w)",
             " (water between 0 and 30 \u00B0C: 4162 to 4219 kJ/(m\u00B3\u00B7K))",
             "write \u03C1_w*c_p with both declared to say so; for a glycol mix the number "
             "is smaller",
             "write the density and specific heat in cells that hold their units to say so",
             density * specific_heat, water_heat_least, water_heat_greatest},
            {rules::trade_constant, "the heat capacity of a volume of air", "\u03C1_a\u00B7c_p,a",
             "1/(\u03C1_a\u00B7c_p,a)",
             " (dry air at 101.325 kPa between 0 and 40 \u00B0C: 1.13 to 1.30 kJ/(m\u00B3\u00B7K); "
             "at altitude it is less)",
             "write \u03C1_a*c_p with both declared to say so, with the density at the site's "
             "altitude and temperature",
             "write the density and specific heat in cells that hold their units to say so",
             density * specific_heat, air_heat_least, air_heat_greatest},
            {rules::trade_constant, "the density of water", "\u03C1_w", "1/\u03C1_w",
             " (water between 0 and 30 \u00B0C: 995.65 to 999.975 kg/m\u00B3)",
             "declare the water's density with its unit (\u03C1_w : kg/m^3 = 998) to say so; "
             "for another liquid the specific gravity must multiply \u03C1_w",
             "write the density in a cell that holds its unit to say so", density, water_least,
             water_greatest},
            {rules::trade_constant, "the molar volume of an ideal gas", "V_m = R\u00B7T/p", "1/V_m",
             " (at 101.325 kPa between 0 and 25 \u00B0C: 22.41 to 24.47 L/mol; the permit's "
             "standard conditions decide which)",
             "declare the standard molar volume with its unit to say so: V_m : L/mol = "
             "22.414 at 0 \u00B0C (per Nm\u00B3), 24.45 at 25 \u00B0C",
             "write the molar volume in a cell that holds its unit to say so",
             length * length * length / amount, molar_volume_least, molar_volume_greatest},
            // Water's latent heat of evaporation at 100 °C, 2256.4 kJ/kg (IAPWS-IF97 steam
            // tables, from memory), and 970.3 Btu/lb "from and at 212 °F" (2256.9 kJ/kg, the
            // boiler trade's, from memory): the 970, 2257 and 2260 of steam loads and the 34.5
            // lb/h per boiler horsepower (33,475 Btu/h / 970.3 Btu/lb).
            {rules::trade_constant, "the latent heat of evaporation of water at 100 \u00B0C",
             "h_fg", "1/h_fg", " (2256 to 2257.5 kJ/kg at atmospheric pressure)",
             "declare the latent heat with its unit (h_fg : kJ/kg = 2257) to say so; at a "
             "steam pressure above atmospheric it is less",
             "write the latent heat in a cell that holds its unit to say so",
             length * length / (time * time), 2256.0e3, 2257.5e3},
            // The air trade's 4.5 lb/h per cfm (0.075 lb/ft³ times 60 min/h) in moisture and
            // steam loads, m = 4.5*cfm*ΔW (common practice). At 0 °C the tables print the real
            // gas's 1.293 kg/m³ (DIN 1343's normal state, from memory), 0.06 % above the ideal
            // gas's 1.2922: a normal cubic metre's mass.
            {rules::trade_constant, "the density of air", "\u03C1_a", "1/\u03C1_a",
             " (dry air at 101.325 kPa between 0 and 40 \u00B0C: 1.13 to 1.293 kg/m\u00B3; "
             "at altitude it is less)",
             "declare the air's density with its unit (\u03C1_a : kg/m^3 = 1.2), at the "
             "site's altitude and temperature, to say so",
             "write the air's density in a cell that holds its unit to say so", density,
             air_density(40.0), air_at_normal_state, carried_quantity::term_kind::volume_flow},
            // Wind's velocity pressure q = 0.00256*K_z*K_zt*K_d*V^2 in psf from mph (ASCE 7-16,
            // eq. 26.10-1, from memory) and 0.613*V^2 in Pa from m/s: half the density of air.
            {rules::trade_constant, "half the density of air", "\u03C1_a/2", "2/\u03C1_a",
             " (dry air at 101.325 kPa between 0 and 40 \u00B0C: 0.56 to 0.65 kg/m\u00B3; the "
             "wind codes take 15 \u00B0C, 0.613)",
             "declare the air's density with its unit (\u03C1_a : kg/m^3 = 1.225) and write "
             "0.5*\u03C1_a*V^2 to say so",
             "write the air's density in a cell that holds its unit to say so", density,
             air_density(40.0) / 2.0, air_density(0.0) / 2.0,
             carried_quantity::term_kind::velocity_squared},
            // The latent load q = 0.68*cfm*ΔW in Btu/h with ΔW in gr/lb, 4840 with ΔW in
            // lb/lb (common practice).
            {rules::trade_constant, "the latent heat of the moisture in a volume of air",
             "\u03C1_a\u00B7h_fg", "1/(\u03C1_a\u00B7h_fg)",
             " (dry air at 101.325 kPa between 0 and 40 \u00B0C, water's latent heat 2406 to "
             "2503 kJ/kg: 2.71 to 3.23 MJ/m\u00B3; at altitude it is less)",
             "write \u03C1_a*h_fg with both declared to say so, with the density at the "
             "site's altitude and temperature",
             "write the density and latent heat in cells that hold their units to say so",
             density * length * length / (time * time), air_latent_least, air_latent_greatest,
             carried_quantity::term_kind::volume_flow},
            // The molar gas constant R = 8.314462618 J/(mol·K) (CODATA 2018), as the gas
            // trades print it in their units: 10.73 psia·ft³/(lbmol·°R), 1545 ft·lbf/(lbmol·°R),
            // 0.08206 L·atm/(mol·K), 0.08314 L·bar/(mol·K) (common practice).
            {rules::trade_constant, "the molar gas constant", "R = 8.314462618 J/(mol\u00B7K)",
             "1/R", "", "write {R} instead to say so",
             "write R in a cell that holds its unit to say so",
             mass * length * length / (time * time) / amount / temperature, 8.314462618,
             8.314462618, carried_quantity::term_kind::any, "{R}"},
            // Dry air's molar mass: 28.96442 g/mol in ISO 2533 (from memory), 28.9647 in
            // common practice, 28.97 as most handbooks round it: a gas's molar mass as 28.97
            // times its specific gravity.
            {rules::trade_constant, "the molar mass of dry air", "M_a", "1/M_a",
             " (28.964 to 28.97 g/mol as the handbooks print it)",
             "declare it with its unit (M_a : g/mol = 28.97) to say so",
             "write the molar mass in a cell that holds its unit to say so", mass / amount,
             0.02896442, 0.02897},
            // Water's molar concentration ρ_w/M_w with M_w = 18.015 g/mol (IUPAC standard
            // atomic weights, from memory) over water's densities from 0 to 30 °C: 55.27 to
            // 55.51 kmol/m³, the 55.5 of a Henry constant turned from mole fraction to
            // concentration in dilute water (common practice).
            {rules::trade_constant, "the molar concentration of water", "c_w = \u03C1_w/M_w",
             "1/c_w", " (water between 0 and 30 \u00B0C: 55.27 to 55.51 kmol/m\u00B3)",
             "declare it with its unit (c_w : kmol/m^3 = 55.5) to say so",
             "write the molar concentration in a cell that holds its unit to say so",
             amount / (length * length * length), water_least / 0.018015,
             water_greatest / 0.018015},
            // Calcium carbonate's equivalent weight, 100.09/2 = 50.04 g/eq (IUPAC standard
            // atomic weights, from memory): the 50 of mg/L as CaCO3 to meq/L in water
            // treatment (common practice).
            {rules::trade_constant, "the equivalent weight of calcium carbonate", "50.04 g/eq",
             "1/(50.04 g/eq)", " (CaCO\u2083, 100.09 g/mol over 2 equivalents)",
             "declare it with its unit (EW : mg/mmol = 50) to say so",
             "write the equivalent weight in a cell that holds its unit to say so", mass / amount,
             0.05004, 0.05005},
            // The hours of a year: 8760 for 365 days, 8766 for 365.25, 8784 for a leap year
            // (common practice), in annual energies and running costs.
            {rules::trade_constant, "the length of a year", "1 a = 8760 h", "1/(1 a)",
             " (365 to 366 days)", "declare the hours with their unit (t_a : h = 8760) to say so",
             "write the hours in a cell marked h to say so", time, 365.0 * 86400.0,
             366.0 * 86400.0},
            // Water's c_p, 4219.9 to 4180.1 J/(kg·K) from 0 to 30 °C (as above): the 4.19 and
            // 4.186 of a heat balance on a mass flow, m·4.19·ΔT/3600 in kW from kg/h.
            {rules::trade_constant, "the specific heat of water", "c_p,w", "1/c_p,w",
             " (water between 0 and 30 \u00B0C: 4.180 to 4.220 kJ/(kg\u00B7K))",
             "declare the specific heat with its unit (c_p : kJ/(kg*K) = 4.19) to say so; for a "
             "glycol mix or another liquid it is less",
             "write the specific heat in a cell that holds its unit to say so", specific_heat,
             4180.1, 4219.9},
            // Dry air's specific gas constant, R/M = 8.314462618/0.0289647 = 287.05 J/(kg·K)
            // (CODATA 2018's R, ISO 2533's molar mass, from memory): the 287 and 0.287 of
            // ρ = p/(R·T) in kg/m³ from Pa or kPa, and the US 53.35 ft·lbf/(lb·°R).
            {rules::trade_constant, "the gas constant of dry air", "R_a = R/M_a", "1/R_a",
             " (287.05 J/(kg\u00B7K); for humid air or another gas it differs)",
             "declare the gas constant with its unit (R_a : J/(kg*K) = 287.05) to say so",
             "write the gas constant in a cell that holds its unit to say so", specific_heat, 287.0,
             287.1},
            // The hours of a day, 24 (NIST SP 811 (2008), B.8): a day's energy from a mean
            // load, P·24 in kWh or TR·h, as the hours of a year give a year's.
            {rules::trade_constant, "the length of a day", "1 d = 24 h", "1/(1 d)", "",
             "declare the hours with their unit (t_d : h = 24) to say so",
             "write the hours in a cell marked h to say so", time, 86400.0, 86400.0},
            // Dry air at a standard state: 1.225 kg/m³ at 15 °C and 101.325 kPa (ISO 2533:1975,
            // the standard atmosphere at sea level, from memory), 1.204 at 20 °C, 1.293 at 0 °C,
            // the US 0.0765 lb/ft³ at 60 °F (common practice): the ρ_0 of a density corrected
            // to a site, ρ = 1.225*(p/101.325)*(288.15/T). Printed to four figures (three
            // for 0.0765), never a factor's 1.2 or 1.25. Nitrogen's 1.2506 kg/Nm³ at 0 °C (CRC
            // Handbook of Chemistry and Physics, from memory) lies inside.
            {rules::trade_constant,
             "the density of air, or nitrogen, at a standard state",
             "\u03C1_0",
             "1/\u03C1_0",
             " (dry air at 101.325 kPa between 0 and 20 \u00B0C: 1.204 to 1.293 kg/m\u00B3; "
             "nitrogen at 0 \u00B0C: 1.2506)",
             "declare the reference density with its unit (\u03C1_0 : kg/m^3 = 1.225) to say so",
             "write the density in a cell that holds its unit to say so",
             density,
             air_density(20.0),
             air_density(0.0),
             carried_quantity::term_kind::any,
             {},
             0.001},
            // The Stefan–Boltzmann constant, σ = 5.670374419e-8 W/(m²·K⁴) (CODATA 2018): the
            // 5.67E-8 of a radiant loss σ·ε·A·(T_1⁴ - T_2⁴), and the US 0.1714E-8
            // Btu/(h·ft²·°R⁴).
            {rules::trade_constant, "the Stefan-Boltzmann constant",
             "\u03C3 = 5.670374419e-8 W/(m\u00B2\u00B7K\u2074)", "1/\u03C3", "",
             "declare it with its unit (\u03C3 : W/(m^2*K^4) = 5.670374419e-8) to say so",
             "write it in a cell that holds its unit to say so",
             mass / (time * time * time) / (temperature * temperature * temperature * temperature),
             5.670374419e-8, 5.670374419e-8},
            // Water vapour's specific gas constant, R/M_w = 8.314462618/0.01801528 = 461.52
            // J/(kg·K) (CODATA 2018's R, IUPAC's molar mass, from memory): the 216.7 of a
            // vapour density ρ_v = 216.7*e/T in g/m³ from hPa and K, one over it.
            {rules::trade_constant, "the gas constant of water vapour", "R_w = R/M_w", "1/R_w",
             " (461.5 J/(kg\u00B7K))",
             "declare the gas constant with its unit (R_w : J/(kg*K) = 461.5) to say so",
             "write the gas constant in a cell that holds its unit to say so", specific_heat, 461.5,
             461.55},
            // The specific gas constants of the other gases plants store and burn, R/M with
            // CODATA 2018's R and IUPAC's molar masses (from memory): nitrogen 296.80, oxygen
            // 259.84, carbon dioxide 188.92, methane 518.28, hydrogen 4124.2 J/(kg·K), the 296.8
            // of a buffer tank's stored mass m = p·V/(296.8·T).
            // Pipeline natural gas: a higher heating value of about 1000 to 1050 Btu/ft³, 37
            // to 39 MJ/m³ (GPSA Engineering Data Book, sec. 23; from memory), and the US fuel
            // gas codes' 1000 Btu per cubic foot where the supplier gives none (common
            // practice): the 1000 of a burner's gas flow V = Q_Btuh/1000 in cfh, the 10.5
            // kWh/m³ of a meter's energy. Read only in a heat or a fuel's amount.
            {rules::trade_constant, "the heating value of natural gas", "HV", "1/HV",
             " (pipeline natural gas: 35 to 42 MJ/m\u00B3, 940 to 1130 Btu/ft\u00B3; the "
             "supplier's analysis decides)",
             "declare the heating value with its unit (HV : Btu/ft^3 = 1000) to say so",
             "write the heating value in a cell that holds its unit to say so",
             mass / (length * time * time), 35.0e6, 42.0e6, carried_quantity::term_kind::fuel_gas},
            gas_constant("the gas constant of nitrogen", "R_N2 = R/M_N2", "1/R_N2",
                         "declare the gas constant with its unit (R_N2 : J/(kg*K) = 296.8) to "
                         "say so",
                         296.8, 296.85),
            gas_constant("the gas constant of oxygen", "R_O2 = R/M_O2", "1/R_O2",
                         "declare the gas constant with its unit (R_O2 : J/(kg*K) = 259.8) to "
                         "say so",
                         259.8, 259.85),
            gas_constant("the gas constant of carbon dioxide", "R_CO2 = R/M_CO2", "1/R_CO2",
                         "declare the gas constant with its unit (R_CO2 : J/(kg*K) = 188.9) to "
                         "say so",
                         188.9, 188.95),
            gas_constant("the gas constant of methane", "R_CH4 = R/M_CH4", "1/R_CH4",
                         "declare the gas constant with its unit (R_CH4 : J/(kg*K) = 518.3) to "
                         "say so",
                         518.2, 518.35),
            gas_constant("the gas constant of hydrogen", "R_H2 = R/M_H2", "1/R_H2",
                         "declare the gas constant with its unit (R_H2 : J/(kg*K) = 4124) to "
                         "say so",
                         4124.0, 4125.0),
            // A tank shell's hoop tension per unit height over a wall of two faces: API 650's
            // one-foot method, t = 4.9*D*(H - 0.3)*G/S in mm from m and MPa, and its US
            // 2.6*D*(H - 1)*G/S in inches from ft and psi (API 650, 5.6.3.2, from memory):
            // half water's specific weight in the units around it.
            {rules::gravity_number, "half the specific weight of water", "\u03B3_w/2", "2/\u03B3_w",
             " (water between 0 and 30 \u00B0C; the 4.9 and 2.6 of a tank shell's one-foot "
             "method)",
             "write \u03C1_w*{g_n}/2, with \u03C1_w declared, to say so",
             "write the density and g in cells that hold their units to say so",
             density * acceleration, water_least * standard_gravity / 2.0,
             water_greatest * standard_gravity / 2.0},
            // The fan trade's velocity pressure p_v = (V/4005)² in in. w.g. from fpm, and
            // V = 4005·√p_v (ASHRAE Fundamentals, duct design, from memory): 4005 is √(2/ρ)
            // of standard air, 0.075 lb/ft³, in those units (V = √(2·p_v/ρ)).
            {rules::trade_constant, "the square root of two over the density of air",
             "\u221A(2/\u03C1_a)", "\u221A(\u03C1_a/2)",
             " (dry air at 101.325 kPa between 0 and 40 \u00B0C; the fan trade's 4005 takes "
             "standard air, 0.075 lb/ft\u00B3)",
             "declare the air's density with its unit and write sqrt(2*p_v/\u03C1_a) to say so",
             "write the air's density in a cell that holds its unit to say so",
             density.pow(rational(-1, 2)), std::sqrt(2.0 / air_density(0.0)),
             std::sqrt(2.0 / air_density(40.0))},
            // A static gas column, p_2 = p_1·exp(0.01875·γ_g·D/(z·T)) in psia from ft and °R
            // (GPSA Engineering Data Book; Katz's static column, from memory): 0.01875 °R/ft is
            // g·M_air/R, air's molar mass 28.96 to 28.97 g/mol (common practice) with g_n and
            // CODATA 2018's R, 0.03416 K/m in SI.
            {rules::gravity_number, "g·M_air/R, the gas column's constant", "g_n·M_air/R",
             "R/(g_n·M_air)",
             " (air's molar mass 28.96 to 28.97 g/mol; 0.01875 °R/ft, 0.03416 K/m)",
             "declare it with its unit (k_gc : K/m = 0.03416) to say so",
             "write it in a cell that holds its unit (°R/ft) to say so", temperature / length,
             standard_gravity * 0.02896 / 8.314462618, standard_gravity * 0.02897 / 8.314462618},
            // One atmosphere over dry air's gas constant, p_0/R_a = 101325/287.05 = 352.99
            // kg·K/m³: the 353 of a hot gas's density ρ = 353/T from kelvins at ambient
            // pressure (smoke control, CIBSE Guide E, from memory; 1.293·273.15 = 353.2, the
            // normal state's); in US units 39.7 lb·°R/ft³.
            {rules::trade_constant, "dry air's \u03C1\u00B7T at one atmosphere (p_0/R_a)",
             "p_0/R_a", "R_a/p_0",
             " (dry air at 101.325 kPa: 353.0 kg\u00B7K/m\u00B3; at altitude, or for another gas, "
             "it is less)",
             "write p_0/(R_a*T) with both declared to say so (R_a : J/(kg*K) = 287.05)",
             "write the atmosphere and the gas constant in cells that hold their units to say so",
             density * temperature, 352.9, 353.3},
            // √(2g) outside the root: Q = 8.02*C*a*sqrt(H) in cfs from ft² and ft, v =
            // 4.43*sqrt(H) in m/s from m (Torricelli's v = √(2gh); King and Brater, Handbook of
            // Hydraulics, orifices, from memory). Printed to three digits at least: the 3 of a
            // weir's 2/3 is no 1/√(2g) in some units.
            {rules::gravity_number, "the square root of twice standard gravity",
             "\u221A(2\u00B7g_n)", "1/\u221A(2\u00B7g_n)", "",
             "write sqrt(2*{g_n}) instead to say so, or the 2*g under the root beside the head",
             "write sqrt(2*9.80665) or a cell that holds g with its unit to say so",
             acceleration.pow(rational(1, 2)), std::sqrt(2.0 * standard_gravity),
             std::sqrt(2.0 * standard_gravity), carried_quantity::term_kind::any, "sqrt(2*{g_n})",
             2e-3},
            // Water's latent heat below its boiling point, where a cooling tower's or an
            // evaporative condenser's basin water evaporates: 2501 kJ/kg at 0 °C to 2257 at 100
            // °C (IAPWS-IF97 steam tables, from memory), the 1045 Btu/lb near 85 °F and the air
            // trade's 1076 (2502.8 kJ/kg, common practice). A round 1000 is a thousand before it
            // is a latent heat: read only from a number printed to three digits or more.
            {rules::trade_constant,
             "the latent heat of evaporation of water below 100 \u00B0C",
             "h_fg",
             "1/h_fg",
             " (2257 kJ/kg at 100 \u00B0C to 2501 kJ/kg at 0 \u00B0C; 1045 Btu/lb near 85 "
             "\u00B0F)",
             "declare the latent heat with its unit (h_fg : kJ/kg = 2430) for the water's "
             "temperature to say so",
             "write the latent heat in a cell that holds its unit to say so",
             length * length / (time * time),
             2257.5e3,
             2503.0e3,
             carried_quantity::term_kind::any,
             {},
             0.005},
            // Carbon steel's density, 7850 kg/m³ (EN 1991-1-1, Table A.4, from memory), printed
            // 490 or 489.5 lb/ft³, 65.5 lb/gal and 7.85 t/m³ (common practice): a drill string's
            // buoyancy factor BF = 1 - MW/65.5 with the mud weight in ppg, a plate's weight.
            {rules::trade_constant,
             "the density of steel",
             "\u03C1_s",
             "1/\u03C1_s",
             " (carbon steel: 7840 to 7860 kg/m\u00B3; 490 lb/ft\u00B3, 65.5 lb/gal)",
             "declare the steel's density with its unit (\u03C1_s : kg/m^3 = 7850) to say so",
             "write the steel's density in a cell that holds its unit to say so",
             density,
             7840.0,
             7860.0,
             carried_quantity::term_kind::any,
             {},
             0.011},
            // Its unit weight, 77 kN/m³ (from 7850 × 9.81) to EN 1991-1-1's 78.5: a member's
            // self-weight from its area.
            {rules::gravity_number,
             "the unit weight of steel",
             "\u03B3_s = \u03C1_s\u00B7g_n",
             "1/\u03B3_s",
             " (77 to 78.5 kN/m\u00B3)",
             "declare the steel's unit weight with its unit (\u03B3_s : kN/m^3 = 77) to say so",
             "write the steel's unit weight in a cell that holds its unit to say so",
             density * acceleration,
             7840.0 * standard_gravity,
             78.5e3,
             carried_quantity::term_kind::any,
             {},
             0.011},
            // Sea water's density, about 1025 kg/m³ at 35 g/kg salinity (ITTC 7.5-02-01-03,
            // Fresh Water and Seawater Properties, 2011, from memory), printed 64 lb/ft³,
            // 8.55 lb/gal and 1.99 slug/ft³ (common practice): a platform's firewater head, a
            // sea wall's toe pressure, 0.445 psi/ft.
            // Milk's, 1028 to 1035 kg/m³ (from memory), falls in the same range: 8.6 lb/gal.
            {rules::trade_constant, "the density of sea water (or milk)", "\u03C1_sw",
             "1/\u03C1_sw", " (sea water: 1020 to 1030 kg/m\u00B3; 64 lb/ft\u00B3, 8.6 lb/gal)",
             "declare the sea water's density with its unit (\u03C1_sw : kg/m^3 = 1025) to say "
             "so",
             "write the sea water's density in a cell that holds its unit to say so", density,
             1020.0, 1030.0},
            // Its specific weight, 10.05 to 10.1 kN/m³ (1025 × 9.80665 to 1030 × 9.81): a
            // sea wall's 0.445 psi per foot of depth, a caisson's 10.05 kPa/m. Not from 1020:
            // 10.0 kN/m³ would read a bare 1000 (water's density, g left out) as it.
            {rules::gravity_number, "the specific weight of sea water",
             "\u03B3_sw = \u03C1_sw\u00B7g_n", "1/\u03B3_sw",
             " (sea water, 1025 to 1030 kg/m\u00B3: 10.05 to 10.1 kN/m\u00B3, 0.445 psi/ft)",
             "write \u03C1_sw*{g_n}, with \u03C1_sw declared, to say so",
             "write the density and g in cells that hold their units to say so",
             density * acceleration, 1025.0 * standard_gravity, 1030.0 * 9.81},
            // Hot water's density, 995.65 kg/m³ at 30 °C to 958.4 at 100 °C (IAPWS-95 as
            // tabulated in the CRC Handbook; from memory): a heating circuit's 977.8 at
            // 70 °C, a calorifier's 983.2 at 60 °C. A flow in L/s from kg/s divides by it.
            {rules::trade_constant,
             "the density of hot water",
             "\u03C1_w",
             "1/\u03C1_w",
             " (water between 30 and 100 \u00B0C: 958.4 to 995.65 kg/m\u00B3)",
             "declare the water's density with its unit (\u03C1_w : kg/m^3 = 977.8) to say so",
             "write the density in a cell that holds its unit to say so",
             density,
             958.0,
             995.65,
             carried_quantity::term_kind::any,
             {},
             0.0,
             false},
            // A water-glycol mix's ρ·c_p, ethylene or propylene glycol from 20 to 50 % by mass
            // between -10 and 40 °C: about 3.45 to 4.10 MJ/(m³·K) (ASHRAE Handbook—Fundamentals,
            // the glycol tables of ch. 31, from memory), below water's 4.16. The hydronic trade's
            // 500 becomes 413 to 490 (465 for 25 % propylene glycol); its 4.19 becomes 3.45 to 4.1.
            {rules::trade_constant,
             "the heat capacity of a volume of a water-glycol mix",
             "\u03C1\u00B7c_p",
             "1/(\u03C1\u00B7c_p)",
             " (ethylene or propylene glycol, 20 to 50 % by mass, -10 to 40 \u00B0C: about 3.45 "
             "to 4.10 MJ/(m\u00B3\u00B7K); for water it is 4.16 to 4.22)",
             "write \u03C1*c_p with both declared for the mix to say so; for plain water the "
             "number is water's (500 in Btu/(h\u00B7gpm\u00B7\u00B0F))",
             "write the density and specific heat in cells that hold their units to say so",
             density * specific_heat,
             3.45e6,
             4.10e6,
             carried_quantity::term_kind::any,
             {},
             0.0,
             false,
             400.0,
             500.0},
        }};
    }();
    return table;
}

// Whether `lacking` is `q` to the power `exponent` (given as a double with a denominator of
// at most 3, as written powers are).
bool is_power_of(const dimension& lacking, const dimension& q, double exponent) {
    // A power keeps which base dimensions are present: most quantities fail here, before any
    // power is formed.
    for (std::size_t i = 0; i < base_dimension_count; ++i)
        if (lacking.exponents()[i].is_zero() != q.exponents()[i].is_zero())
            return false;
    for (std::int64_t denominator = 1; denominator <= 3; ++denominator) {
        const double scaled = exponent * static_cast<double>(denominator);
        const double whole = std::round(scaled);
        if (std::abs(scaled - whole) > 1e-9 || whole == 0.0 || std::abs(whole) > 6)
            continue;
        try {
            return q.pow(rational(static_cast<std::int64_t>(whole), denominator)) == lacking;
        } catch (const std::exception&) {
            return false;
        }
    }
    return false;
}

// Whether the last digit of a number as written (before any exponent) is even.
bool even_last_digit(std::string_view text) {
    const std::size_t end = text.find_first_of("eE");
    const std::string_view digits = text.substr(0, end);
    const std::size_t last = digits.find_last_of("0123456789");
    return last != std::string_view::npos && (digits[last] - '0') % 2 == 0;
}

// Significant figures enough to show the range the number must round.
std::string shown(double v) {
    return fmt::format("{:.4g}", v);
}

} // namespace

std::string_view advice_in_cell_for(std::string_view advice_in_notation) {
    for (const carried_quantity& q : quantities())
        if (q.advice_in_notation == advice_in_notation)
            return q.advice_in_cell;
    return {};
}

bool is_molar_volume(const carried_quantity& q) {
    return &q == &quantities()[molar_volume_row];
}

std::optional<molar_volume_mismatch> molar_volume_off_reference(const gravity_reading& reading,
                                                                double written, bool multiplies,
                                                                double kelvins) {
    constexpr double ice_point = 273.15;
    // least and greatest are the molar volume (or one over it) at 0 and 25 °C.
    const double implied = reading.reciprocal ? ice_point * reading.greatest / written
                                              : ice_point * written / reading.least;
    const double wanted = reading.reciprocal ? reading.greatest * ice_point / kelvins
                                             : reading.least * kelvins / ice_point;
    if (!(wanted > 0) || std::abs(written / wanted - 1.0) <= 0.02)
        return std::nullopt;
    // What the result is off by: the number's ratio, or its inverse where it divides.
    return molar_volume_mismatch{implied - ice_point, wanted,
                                 (multiplies ? written / wanted : wanted / written) - 1.0};
}

std::string molar_volume_message(std::string_view number, const gravity_reading& reading,
                                 const molar_volume_mismatch& off, std::string_view of_what,
                                 std::string_view state) {
    return fmt::format("{} is {}the molar volume of an ideal gas at {:.0f} \u00B0C, but the gas "
                       "volumes {} are at {}, where it is {:.4g}: as written the result is "
                       "{:.1f} % too {}",
                       // + 0.0: a -0.3 °C rounds to "-0" otherwise.
                       number, reading.reciprocal ? "one over " : "",
                       std::round(off.implied_celsius) + 0.0, of_what, state, off.wanted,
                       std::abs(off.result_off) * 100.0, off.result_off > 0 ? "large" : "small");
}

std::string molar_volume_advice(const molar_volume_mismatch& off) {
    return fmt::format("the molar volume follows the reference state of the gas volumes (Nm3 at "
                       "0 \u00B0C, Sm3 at 15 \u00B0C, scf at 60 \u00B0F, all at 101.325 kPa): "
                       "write {:.4g} there",
                       off.wanted);
}

bool lacks_gravity_number(const dimension& lacking, double exponent) {
    for (const carried_quantity& q : quantities())
        if (is_power_of(lacking, q.dim, exponent) || is_power_of(lacking, q.dim, -exponent))
            return true;
    return false;
}

std::string gravity_message(std::string_view written, const gravity_reading& r) {
    const carried_quantity& q = *r.quantity;
    if (!r.reciprocal && q.least == q.greatest && std::abs(r.stands_for - q.least) < 1e-9)
        return fmt::format("'{}' is read as {}, {}", written, q.what, q.symbol);
    const std::string value = r.least == r.greatest
                                  ? fmt::format("{:.5g}", r.stands_for)
                                  : fmt::format("{} to {}", shown(r.least), shown(r.greatest));
    return fmt::format("'{}' is read as {}{} in the units around it: {} comes to {} there{}",
                       written, r.reciprocal ? "one over " : "", q.what,
                       r.reciprocal ? q.reciprocal : q.symbol, value, q.range_note);
}

double half_unit_in_last_digit(std::string_view text) {
    int decimals = 0;
    bool after_point = false;
    std::size_t i = 0;
    for (; i < text.size(); ++i) {
        const char c = text[i];
        if (c == '.') {
            after_point = true;
        } else if (c >= '0' && c <= '9') {
            if (after_point)
                ++decimals;
        } else {
            break;
        }
    }
    int exponent = 0;
    if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
        const std::string tail(text.substr(i + 1));
        exponent = static_cast<int>(std::strtol(tail.c_str(), nullptr, 10));
        if (exponent > 300 || exponent < -300)
            return 0.0;
    }
    // A whole number's trailing zeros may only place the point: 9810 N/m³ is 9.81 kN/m³.
    int placing_zeros = 0;
    if (!after_point)
        for (std::size_t j = i; j > 1 && text[j - 1] == '0'; --j)
            ++placing_zeros;
    return 0.5 * std::pow(10.0, exponent - decimals + placing_zeros);
}

namespace {

// 3.6e6 in ρ·g·Q·H/(3.6e6·η) is 3600 s/h times 1000 W/kW (1 kWh = 3.6 MJ, SI Brochure 9th
// ed., Table 8), 6e4 the L/min in a m³/s: the clock's ratios times a power of ten, exactly as
// written. (A 6 or a 60 alone is not counted: the first is a coefficient as often as not, and
// the second is set aside already.)
bool is_clock_ratio_times_power_of_ten(double value) {
    for (const double ratio : {3600.0, 86400.0, 60.0}) {
        const double decades = std::round(std::log10(value / ratio));
        const int least = ratio == 60.0 ? 1 : -3;
        if (decades < least || decades > 6 || decades == 0.0)
            continue;
        if (std::abs(value / (ratio * std::pow(10.0, decades)) - 1.0) < 1e-12)
            return true;
    }
    return false;
}

} // namespace

std::optional<gravity_reading> read_gravity_number(double term_scale, double reference_scale,
                                                   std::span<const scale_literal> literals,
                                                   std::span<const std::string_view> texts,
                                                   const dimension& lacking, bool flipped_too,
                                                   carried_quantity::term_kind term,
                                                   unsigned clock_units, bool beside_percentage) {
    if (literals.empty() || literals.size() > most_numbers || texts.size() != literals.size() ||
        !(term_scale > 0) || !(reference_scale > 0) || !std::isfinite(term_scale) ||
        !std::isfinite(reference_scale))
        return std::nullopt;
    std::optional<gravity_reading> best;
    std::tuple<bool, bool, bool, bool, bool, double, bool> best_rank{};
    for (std::size_t k = 0, tries = flipped_too ? 2 : 1; k < literals.size() * tries; ++k) {
        // The second pass reads each number as if written the other way round (Q*H*3960).
        const bool flipped = k >= literals.size();
        const std::size_t at = k % literals.size();
        const scale_literal& number = literals[at];
        const double x = flipped ? -number.exponent : number.exponent;
        // 1e9 in V_mm3*7850/1e9 converts mm³ to m³: a power of ten past a thousand is a unit
        // conversion, never a property of water or gravity written out.
        if (!(number.value > 0) || x == 0.0 || (number.power_of_ten && std::abs(number.power) > 3))
            continue;
        // The clock's ratios (60, 1440, 3600, 86400; SI Brochure 9th ed., Table 8) convert
        // time, and are no property of water or gravity: 3600*Q/(c_p*ΔT) into m³/h lacks a
        // density, which a 3600 read as one would hide. (24 stays: the chiller rule's
        // TR = gpm·ΔT/24 is 12000/500, water's heat capacity per gpm.)
        if (number.value == 60.0 || number.value == 1440.0 || number.value == 3600.0 ||
            number.value == 86400.0)
            continue;
        if (beside_percentage && texts[at] == "100")
            continue;
        const double half_unit = half_unit_in_last_digit(texts[at]);
        for (const carried_quantity& q : quantities()) {
            if ((q.only_in != carried_quantity::term_kind::any && q.only_in != term &&
                 !(q.only_in == carried_quantity::term_kind::fuel_gas &&
                   term == carried_quantity::term_kind::volume_flow)) ||
                (q.finest_rounding > 0.0 && half_unit > q.finest_rounding * number.value))
                continue;
            // But a 24 is no density: W/(24*w) from kg/d into L/h lacks the solution's density
            // (1 kg/L only for water), which a 24 read as one would hide. Nor are the hours of
            // a year anything but a time: Q*0.717*8760/1000 into t/yr holds methane's density,
            // not water's in 8760.
            if ((number.value == 24.0 && q.dim == density_dimension()) ||
                ((number.value == 8760.0 || number.value == 8766.0 || number.value == 8784.0) &&
                 &q != &quantities()[year_row]))
                continue;
            // A day or a year is 24, 1440, 86400 or 8760 in some clock unit, never a power of
            // ten. Where a formula's units count per day (h/d) a term lacking the number of
            // days has the day's length exactly 1 in those units, and its /1000 from kW to MW
            // would be read as the day: E_s = P*h_d/1000 in MWh is a day's energy set equal
            // to a season's, an error.
            if (number.power_of_ten &&
                (&q == &quantities()[day_row] || &q == &quantities()[year_row]))
                continue;
            // A glycol mix's heat capacity spans 17 %, wide enough to fit 1.08, 4.19 over a gpm
            // or 1.163/1000 by chance: such a quantity is read only as the trade prints it.
            if (q.printed_below > 0.0 &&
                (flipped || !(number.value >= q.printed_least && number.value < q.printed_below)))
                continue;
            for (const bool reciprocal : {false, true}) {
                if (!is_power_of(lacking, q.dim, reciprocal ? -x : x))
                    continue;
                if (reciprocal && !q.reads_reciprocal)
                    continue;
                // What the number stands for, in SI: the quantity or one over it.
                const double si_low = reciprocal ? 1.0 / q.greatest : q.least;
                const double si_high = reciprocal ? 1.0 / q.least : q.greatest;
                const std::size_t others = literals.size() - 1;
                // A number read the other way round is read alone: with the other numbers
                // free to be conversions, some subset would explain almost any number.
                const std::uint32_t masks = flipped ? 1U : (1U << others);
                for (std::uint32_t mask = 0; mask < masks; ++mask) {
                    // The conversions C among the other numbers: written_R·s_R =
                    // written_E·s_E·(Q/ℓ)^x/C gives ℓ = Q·(s_E / (s_R·C))^(1/x).
                    double conversions = 1.0;
                    bool powers_of_ten_only = true;
                    // The conversions' own rounding (6895 for 6894.757 Pa per psi) moves the
                    // quantity in the units around it by as much, relatively.
                    double conversions_rounding = 0.0;
                    // A typed g taken for a conversion ("2 is twice g beside 9.81 ×
                    // 0.101937"): a reading that needs it so comes after one that reads it.
                    bool gravity_as_conversion = false;
                    for (std::size_t j = 0, bit = 0; j < literals.size(); ++j) {
                        if (j == at)
                            continue;
                        if ((mask >> bit++) & 1U) {
                            gravity_as_conversion =
                                gravity_as_conversion ||
                                std::abs(literals[j].value / standard_gravity - 1.0) < 2e-3;
                            conversions *= std::pow(literals[j].value, literals[j].exponent);
                            powers_of_ten_only = powers_of_ten_only && literals[j].power_of_ten;
                            if (!literals[j].power_of_ten && literals[j].value > 0)
                                conversions_rounding += std::abs(literals[j].exponent) *
                                                        half_unit_in_last_digit(texts[j]) /
                                                        literals[j].value;
                        }
                    }
                    const double in_units =
                        std::pow(term_scale / (reference_scale * conversions), 1.0 / x);
                    double low = si_low * in_units;
                    double high = si_high * in_units;
                    if (!(low > 0) || !std::isfinite(high))
                        continue;
                    // The quantity in a unit a power of ten away (9.81 beside kPa where Pa was
                    // meant): read it all the same, so that the scale rule names the 1000
                    // rather than a missing g.
                    const double apart = std::sqrt(low * high) / number.value;
                    const double shift = std::round(std::log10(apart));
                    // Or with a factor of the clock or the grain left out (9.81 in
                    // ρ*9.81*Q*H/1000 with Q in m³/h, 4.5 in 4.5*cfm*ΔW with ΔW in gr/lb):
                    // the scale rule then names the 3600 or the 7000. Only where the formula
                    // counts in that unit (a cfm with 3600 is some other slip), with no other
                    // numbers than powers of ten taken as conversions, and from a number
                    // printed to 2 % or finer: a 1 or a 2 fits some quantity with almost any
                    // factor, and so do numbers taken with a 3600 or a 1.8.
                    double left_out = std::abs(shift) <= 9.0 ? std::pow(10.0, shift) : 1.0;
                    // The water rule's 500 (Btu/h per gpm·°F; ASHRAE Fundamentals, common
                    // practice) is printed so by the trade, not rounded to its hundreds.
                    const bool printed_rule = number.value == 500.0 && texts[at] == "500";
                    if (clock_units != 0 && powers_of_ten_only && !flipped &&
                        (half_unit <= 0.02 * number.value || printed_rule))
                        for (const factor_left_out& factor : unit_factors_left_out) {
                            if ((factor.units & clock_units) == 0)
                                continue;
                            for (const double f : {factor.factor, 1.0 / factor.factor})
                                if (std::abs(std::log(apart / f)) <
                                    std::abs(std::log(apart / left_out)))
                                    left_out = f;
                        }
                    const bool shifted = left_out != 1.0;
                    if (shifted && flipped)
                        continue; // two slips at once is no reading, only a guess
                    // The round 10 kN/m³ only as typed, alone and as it is: never a 1000 or a
                    // 10 taken with other numbers as conversions, nor one over it.
                    if (&q == &quantities()[round_water_row] &&
                        (shifted || flipped || reciprocal || mask != 0 || texts[at] != "10"))
                        continue;
                    const double power_of_ten = left_out;
                    low /= power_of_ten;
                    high /= power_of_ten;
                    const double nearest = std::clamp(number.value, low, high);
                    const double distance = std::abs(number.value - nearest);
                    // 19.62 and 64.4 are twice a rounded g (9.81, 32.2; common practice in
                    // V²/(2g)): where the last digit is even, half the number has the same
                    // digits, and rounds g to them. (19.7's half, 9.85, rounds no g.)
                    const double rounding =
                        &q == &quantities()[twice_gravity_row] && even_last_digit(texts[at])
                            ? 2.0 * half_unit
                            : half_unit;
                    if (distance > (rounding + nearest * conversions_rounding / std::abs(x)) *
                                       (1.0 + 1e-9) ||
                        std::abs(number.value / nearest - 1.0) > closest_reading)
                        continue;
                    // An unshifted reading first, then one that needs no other number taken as
                    // a conversion (9.81 in v²/(2*9.81), not the 2 as twice g beside a 9.81
                    // conversion), then the closest; on a tie the number that is the quantity
                    // itself (62.4 in p*144/62.4, not 144 as one over it).
                    // A number that is itself a unit conversion (1000, 86400, 3.281) is read
                    // last: in Δp_kPa*1000/(ρ*9.81) the 9.81 is g and the 1000 converts kPa.
                    const auto rank = std::make_tuple(
                        flipped, shifted,
                        looks_like_conversion(number, true) ||
                            is_clock_ratio_times_power_of_ten(number.value),
                        gravity_as_conversion, mask != 0, distance / nearest, reciprocal);
                    if (best && rank >= best_rank)
                        continue;
                    best_rank = rank;
                    // Once the number stands for the quantity, the term agrees with the
                    // reference up to the conversions and the power of ten.
                    const double si_value = nearest * power_of_ten / in_units;
                    best = gravity_reading{
                        at,      &q,      reciprocal,
                        flipped, shifted, nearest,
                        low,     high,    term_scale * std::pow(si_value / nearest, x)};
                }
            }
        }
    }
    return best;
}

unsigned clock_units_in(std::string_view unit_text) {
    static constexpr std::array<std::string_view, 13> minute{"min",  "cfm",  "scfm", "acfm", "icfm",
                                                             "CFM",  "SCFM", "gpm",  "GPM",  "fpm",
                                                             "sfpm", "rpm",  "lpm"};
    static constexpr std::array<std::string_view, 12> hour{
        "h", "hr", "hrs", "gph", "mph", "kph", "scfh", "cfh", "tph", "MBH", "Btuh", "BTUH"};
    static constexpr std::array<std::string_view, 16> day{
        "d",   "day",  "days", "MGD",  "mgd",    "gpd",    "GPD",   "bpd",
        "BPD", "BOPD", "BWPD", "scfd", "MMscfd", "MMSCFD", "Mscfd", "MLD"};
    const auto in = [](const auto& list, std::string_view token) {
        return std::find(list.begin(), list.end(), token) != list.end();
    };
    unsigned found = 0;
    std::size_t i = 0;
    while (i < unit_text.size()) {
        if (!std::isalpha(static_cast<unsigned char>(unit_text[i]))) {
            ++i;
            continue;
        }
        const std::size_t begin = i;
        while (i < unit_text.size() && std::isalpha(static_cast<unsigned char>(unit_text[i])))
            ++i;
        const std::string_view token = unit_text.substr(begin, i - begin);
        if (in(minute, token))
            found |= clock_minute;
        if (in(hour, token) || token.ends_with("Wh") || token.ends_with("VAh"))
            found |= clock_hour;
        if (in(day, token))
            found |= clock_day;
        if (token == "gr")
            found |= clock_grain;
    }
    return found;
}

} // namespace plumb
