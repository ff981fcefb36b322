// "ρ*9.81*h", "0.052*MW*TVD", "0.433*h_ft", "Q*H/(3960*η)", "1.08*cfm*ΔT", "C*M/24.45":
// numbers that carry a physical quantity, gravity most often. Engineers write g, water's
// specific weight and density, a volume's heat capacity and a gas's molar volume as numbers in
// their own units far more often than as symbols; a term that lacks exactly such a quantity,
// and holds it as a number in the units around it, is read that way.
#pragma once

#include "check/scale_match.hpp"
#include "plumb/dimension.hpp"

#include <cstdint>
#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace plumb {

// A quantity the trades write as a bare number, with the range of SI values its printed
// roundings stand for: g_n exactly, ρ_w and γ_w over water's densities between 0 and 30 °C, the
// volumetric heat capacities ρ·c_p of water and air inside the HVAC trade's 500 and 1.08, and
// an ideal gas's molar volume in the air trade's ppm conversions (24.45, 385.3), and the air
// trade's density and latent heat of a volume of air in its moisture loads (4.5, 0.68, 4840).
struct carried_quantity {
    std::string_view rule;       // gravity-number, or trade-constant for the heat capacities
    std::string_view what;       // "standard gravity"
    std::string_view symbol;     // "g_n = 9.80665 m/s²"
    std::string_view reciprocal; // "1/g_n"
    std::string_view range_note; // where its value comes from, when it is a range
    std::string_view advice_in_notation; // how to say it outright in a .plumb file
    std::string_view advice_in_cell;     // and in a workbook
    dimension dim;
    double least = 0.0;    // SI
    double greatest = 0.0; // SI
    // Read only in a term of that kind (4.5*cfm*ΔW, 0.00256*K_z*V^2): the air trade's per-cfm
    // and per-mph² constants, whose values would otherwise fit too many other numbers.
    // A fuel's heating value stands in a heat or a fuel's amount (power, energy, volume, a
    // volume flow): fuel_gas, which a volume flow also takes.
    enum class term_kind : std::uint8_t { any, volume_flow, velocity_squared, fuel_gas };
    term_kind only_in = term_kind::any;
    // The named constant that writes it in the notation ("{g_n}", "2*{g_n}", "{R}"), where one
    // does: a number that holds it and a conversion is advised as this times the conversion.
    std::string_view named = {};
    // Read only from a number printed finely enough: half a unit in its last digit at most
    // this share of its value (1.225 and 0.0765 for air's density, not a factor's 1.25).
    // 0 reads any number.
    double finest_rounding = 0.0;
    // Read as one over the quantity too (2.31 ft/psi, 3960); false where that would read
    // another quantity's slip (hot water's 1.004 to 1.044 is sea water's 1.025 turned over).
    bool reads_reciprocal = true;
    // Read only from a number printed in this range and multiplying, as the trade prints it
    // (the hydronic 500's glycol figures, 400 to 499); 0 and 0 read any.
    double printed_least = 0.0;
    double printed_below = 0.0;
};

struct gravity_reading {
    std::size_t literal = 0; // which of the term's numbers carries the quantity
    const carried_quantity* quantity = nullptr;
    bool reciprocal = false; // the number is one over the quantity (2.31 ft/psi, 3960)
    bool flipped = false;    // read only as if written the other way round: an error
    bool shifted = false;    // read only in a unit a power of ten away (9.81 beside kPa)
    double stands_for = 0.0; // the quantity in the units around it: the value it rounds
    double least = 0.0;      // the range the quantity takes in those units
    double greatest = 0.0;
    double term_scale = 1.0; // the term's SI value per written value, once read
};

// What to ask where a side or a cell differs from the other by exactly an acceleration: a g
// left out (times g it would match) or one too many, the slip engineers make most.
inline constexpr std::string_view g_left_out_advice =
    "times g it would match; is a g missing from it (\u03C1*g*h)?";
inline constexpr std::string_view g_too_many_advice =
    "divided by g it would match; is a g missing from its denominator (p/(\u03C1*g)), or is "
    "one there too many?";

// Whether a term lacking `lacking` could hold one of the quantities through a number entering
// it with `exponent` (1 in ρ*9.81*h, -1 in p/(ρ*9.81), 1/2 in sqrt(2*9.81*h)): a cheap test
// before the search.
bool lacks_gravity_number(const dimension& lacking, double exponent);

// The advice for a workbook that goes with a quantity's advice for a .plumb file ("write the
// density and g in cells that hold their units" for "write ρ_w*{g_n}"); empty for other text.
std::string_view advice_in_cell_for(std::string_view advice_in_notation);

// Whether the quantity read is an ideal gas's molar volume (24.45, 22.4, 379.5), whose
// temperature a gas volume at reference conditions beside it must share.
bool is_molar_volume(const carried_quantity& q);

// A molar volume read beside gas volumes at reference conditions of another temperature
// ("C_mg = C_ppm*M/24.45" in mg/Nm³): the temperature the number stands for, the number the
// volumes' state wants, and how far the result is off. Empty within 2 %: the US trades'
// 385.3 scf/lbmol at 68 °F beside a standard cubic foot at 60 °F is their convention.
struct molar_volume_mismatch {
    double implied_celsius = 0.0;
    double wanted = 0.0;
    double result_off = 0.0; // relative, + too large
};
std::optional<molar_volume_mismatch> molar_volume_off_reference(const gravity_reading& reading,
                                                                double written, bool multiplies,
                                                                double kelvins);
// "'24.45' is the molar volume of an ideal gas at 25 °C, but the gas volumes of 'C_mg' are at
// 0 °C, where it is 22.41: as written the result is 8.3 % too small"; `of_what` follows
// "the gas volumes".
std::string molar_volume_message(std::string_view number, const gravity_reading& reading,
                                 const molar_volume_mismatch& off, std::string_view of_what,
                                 std::string_view state);
std::string molar_volume_advice(const molar_volume_mismatch& off);

// The number among `literals` that carries g_n or γ_w, or its reciprocal, in the term's own
// units, where the term lacks exactly that quantity to the number's power. `texts` are the
// numbers as written: a number must round a value of the quantity in those units to its last
// printed digit and lie within 0.5 % of it, so that 10 is not read as g (2 % off) but 9.8,
// 9.81, 32.2, the oilfield's 0.052, 62.4 lbf/ft³, 0.433 psi/ft and 2.31 ft/psi are. Other
// numbers of the term may be unit conversions (a /1000 to kPa); every subset of them is tried.
// With `flipped_too`, a number that fits only the other way round (Q*H*3960 for Q*H/3960) is
// read as well, marked `flipped`, for the caller to report.
//
// `clock_units` (from clock_units_in) names the units of time and the grain the formula's
// symbols or cells are written in: where one of their factors (60, 3600, 86400, 7000) stands
// between the number and the quantity, the number is read all the same, and the scale rule
// names the factor left out (9.81 in ρ*9.81*Q*H/1000 with Q in m³/h).
//
// With `beside_percentage`, a 100 among the numbers is the percentage's and is read as no
// quantity (it may still convert): V*f_pct/100/m_d is no volume over water's density.
std::optional<gravity_reading> read_gravity_number(
    double term_scale, double reference_scale, std::span<const scale_literal> literals,
    std::span<const std::string_view> texts, const dimension& lacking, bool flipped_too = false,
    carried_quantity::term_kind term = carried_quantity::term_kind::any, unsigned clock_units = 0,
    bool beside_percentage = false);

// The units of time and the grain a unit as written counts in, as bits: clock_minute ("min",
// "cfm", "gpm"), clock_hour ("h", "kWh", "gph"), clock_day ("d", "MGD", "bpd"), clock_grain
// ("gr").
enum clock_unit : unsigned { clock_minute = 1, clock_hour = 2, clock_day = 4, clock_grain = 8 };
unsigned clock_units_in(std::string_view unit_text);

// The note's words for a reading of the number written `written`.
std::string gravity_message(std::string_view written, const gravity_reading& reading);

// Half a unit in the last printed digit of a number as written: 0.005 for "9.81", 0.5 for
// "32", 0.0005 for "0.052", 50 for "9.8e3"; a whole number's trailing zeros are taken as
// placing the point, not as measured digits: 5 for "9810", 500 for "1000".
double half_unit_in_last_digit(std::string_view text);

} // namespace plumb
