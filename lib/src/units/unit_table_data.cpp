// The rows of the built-in unit table and the SI prefixes.
//
// Policy for the factor columns:
// - `exact_factor` holds the exact relation to SI whenever the unit is defined exactly in
//   terms of SI units, as a decimal or as an integer fraction (the forms rational::parse reads).
//   Where NIST SP 811 prints that exact value rounded to 7 digits, `source` says so and names
//   the definition the exact value follows from.
// - Where no exact relation exists (the acre on the U.S. survey foot, the dalton), the published
//   digits are stored and `source` says "(rounded)" or names the measurement.
// - `factor` is the same value as a double; a test parses `exact_factor` back and compares.
#include "plumb/unit_table.hpp"

#include <span>

namespace plumb::detail {

// Shared with unit_table.cpp, which builds the lookup index over these rows.
std::span<const unit_definition> builtin_units();
std::span<const unit_prefix> builtin_prefixes();

namespace {

using exponents = std::array<std::int8_t, base_dimension_count>;

// Exponents in the order M L T Θ N I J (dimension.hpp).
constexpr exponents dims(int m, int l, int t, int th = 0, int n = 0, int i = 0, int j = 0) {
    return {static_cast<std::int8_t>(m),  static_cast<std::int8_t>(l), static_cast<std::int8_t>(t),
            static_cast<std::int8_t>(th), static_cast<std::int8_t>(n), static_cast<std::int8_t>(i),
            static_cast<std::int8_t>(j)};
}

constexpr exponents none = dims(0, 0, 0);
constexpr exponents mass = dims(1, 0, 0);
constexpr exponents length = dims(0, 1, 0);
constexpr exponents area = dims(0, 2, 0);
constexpr exponents volume = dims(0, 3, 0);
constexpr exponents time = dims(0, 0, 1);
constexpr exponents temperature = dims(0, 0, 0, 1);
constexpr exponents per_time = dims(0, 0, -1);
constexpr exponents velocity = dims(0, 1, -1);
constexpr exponents force = dims(1, 1, -2);
constexpr exponents pressure = dims(1, -1, -2);
constexpr exponents energy = dims(1, 2, -2);
constexpr exponents power = dims(1, 2, -3);
constexpr exponents dynamic_viscosity = dims(1, -1, -1);
constexpr exponents kinematic_viscosity = dims(0, 2, -1);
constexpr exponents volumetric_flow = dims(0, 3, -1);
constexpr exponents resistance = dims(1, 2, -3, 0, 0, -2);
constexpr exponents specific_energy = dims(0, 2, -2);

enum class prefixes : bool { refused, accepted };

constexpr unit_definition absolute(std::string_view symbol, std::string_view name, exponents e,
                                   double factor, std::string_view exact, prefixes p,
                                   std::string_view source) {
    return {symbol, name, e, factor, 0.0, exact, unit_scale::absolute, p == prefixes::accepted,
            source};
}

// Interval scales never take prefixes: "m°C" could mean a thousandth of a degree or a scale
// whose zero also moved, and nobody writes it.
constexpr unit_definition interval(std::string_view symbol, std::string_view name, double factor,
                                   double offset, std::string_view exact, std::string_view source) {
    return {symbol, name, temperature, factor, offset, exact, unit_scale::offset, false, source};
}

// Common practice: gauge pressure is read against the standard atmosphere (101325 Pa); the
// local atmospheric pressure differs, so converting a gauge reading is only as good as that.
constexpr double standard_atmosphere = 101325.0;

constexpr unit_definition gauge(std::string_view symbol, std::string_view name, double factor,
                                std::string_view exact, std::string_view source) {
    return {symbol, name,  pressure, factor, standard_atmosphere, exact, unit_scale::gauge,
            false,  source};
}

// A second spelling of a row: ASCII for a Unicode symbol, or a spelling the trade also uses.
// It is a row of its own so that listings show it and lookups need no second table.
constexpr unit_definition spelled(std::string_view symbol, unit_definition row) {
    row.symbol = symbol;
    return row;
}

constexpr std::string_view si_base = "SI Brochure 9th ed., Table 2";
constexpr std::string_view si_derived = "SI Brochure 9th ed., Table 4";
constexpr std::string_view si_accepted = "SI Brochure 9th ed., Table 8";
constexpr std::string_view nist = "NIST SP 811 (2008), B.8";

// π is irrational: no decimal or fraction is exact, so the text names it.
constexpr double pi = 3.14159265358979323846;

constexpr unit_definition ohm =
    absolute("\u03A9", "ohm", resistance, 1.0, "1", prefixes::accepted, si_derived);
constexpr unit_definition degree_celsius =
    interval("\u00B0C", "degree Celsius", 1.0, 273.15, "1", si_derived);
// The offset is 459.67 × 5/9 K = 45967/180 K exactly.
constexpr unit_definition degree_fahrenheit =
    interval("\u00B0F", "degree Fahrenheit", 5.0 / 9.0, 459.67 * 5.0 / 9.0, "5/9",
             "NIST SP 811 (2008), B.8 (T/K = (t/°F + 459.67)/1.8)");
constexpr unit_definition degree_rankine =
    absolute("\u00B0R", "degree Rankine", temperature, 5.0 / 9.0, "5/9", prefixes::refused,
             "NIST SP 811 (2008), B.8 (T/K = (T/°R)/1.8)");
constexpr unit_definition angle_degree = absolute("\u00B0", "degree (angle)", none, pi / 180.0,
                                                  "pi/180", prefixes::refused, si_accepted);
constexpr unit_definition angle_minute = absolute("\u2032", "minute (angle)", none, pi / 10800.0,
                                                  "pi/10800", prefixes::refused, si_accepted);
constexpr unit_definition angle_second = absolute("\u2033", "second (angle)", none, pi / 648000.0,
                                                  "pi/648000", prefixes::refused, si_accepted);
constexpr unit_definition litre =
    absolute("L", "litre", volume, 1e-3, "0.001", prefixes::accepted, si_accepted);
// The avoirdupois pound, exact since the 1959 international yard and pound agreement (from
// memory); NIST prints it rounded to 4.535924E-01.
constexpr unit_definition pound_mass =
    absolute("lb", "pound (avoirdupois)", mass, 0.45359237, "0.45359237", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.535924E-01; exact 0.45359237 by definition");
// Btu_IT = cal_IT/(g·°C) × lb × °F = 4.1868 J × 453.59237 × 5/9 exactly (the derivation is
// from memory; the product matches the exact value NIST gives).
constexpr unit_definition btu_it =
    absolute("Btu", "British thermal unit (IT)", energy, 1055.05585262, "1055.05585262",
             prefixes::refused, nist);
constexpr unit_definition calorie_it =
    absolute("cal", "calorie (IT)", energy, 4.1868, "4.1868", prefixes::refused, nist);
constexpr unit_definition torr =
    absolute("Torr", "torr", pressure, 101325.0 / 760.0, "20265/152", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 1.333224E+02; exact as 101325/760 Pa");
constexpr unit_definition knot =
    absolute("kn", "knot", velocity, 1852.0 / 3600.0, "463/900", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 5.144444E-01; exact as 1852 m/h");
// A darcy passes 1 cm³/s of a 1 cP fluid through 1 cm² under 1 atm/cm (the definition is from
// memory), so 1 D = 1e-3 Pa·s × 1e-6 m³/s × 1e-2 m / (1e-4 m² × 101325 Pa × 1 s).
constexpr std::string_view darcy_source =
    "NIST SP 811 (2008), B.8 prints 9.869233E-13; exact from the darcy's definition";
constexpr unit_definition darcy = absolute("D", "darcy", area, 1e-7 / 101325.0, "1/1013250000000",
                                           prefixes::refused, darcy_source);
constexpr unit_definition millidarcy =
    absolute("mD", "millidarcy", area, 1e-10 / 101325.0, "1/1013250000000000", prefixes::refused,
             darcy_source);
// A revolution counted as one cycle, as engineers use the speed n in the affinity laws,
// synchronous speed (n = 120 f/p) and shaft power P = 2π n T: 1 r/min = 1/60 s⁻¹ (common
// practice). Counted as 2π rad it would be 0.1047198 rad/s; the 2π then belongs in the formula.
constexpr unit_definition revolution =
    absolute("r", "revolution (one cycle)", none, 1.0, "1", prefixes::refused,
             "common practice: one revolution counted as one cycle, as in n = 120 f/p");
constexpr unit_definition revolution_per_minute =
    absolute("rpm", "revolution per minute", per_time, 1.0 / 60.0, "1/60", prefixes::refused,
             "common practice: one revolution counted as one cycle (1/60 Hz)");
constexpr unit_definition centipoise =
    absolute("cP", "centipoise", dynamic_viscosity, 1e-3, "0.001", prefixes::refused, nist);
constexpr unit_definition day =
    absolute("d", "day", time, 86400.0, "86400", prefixes::refused, si_accepted);
constexpr unit_definition year = absolute("yr", "year (365 days)", time, 31536000.0, "31536000",
                                          prefixes::refused, "NIST SP 811 (2008), B.8");
// A standard cubic foot is a cubic foot of gas at the reference conditions; as a volume it is
// the cubic foot. Which reference conditions apply is for the calc to say (common practice).
constexpr std::string_view standard_volume_source =
    "NIST SP 811 (2008), B.8 (ft^3); oilfield convention (SPE): a cubic foot at standard "
    "conditions";
constexpr unit_definition stock_tank_barrel = absolute(
    "STB", "stock-tank barrel (42 U.S. gal)", volume, 0.158987294928, "0.158987294928",
    prefixes::refused,
    "NIST SP 811 (2008), B.8 (bbl); oilfield convention (SPE): a barrel at stock-tank conditions");
// A gas's volume at reference conditions, as the gas trades size it: a volume, as the
// oilfield's scf is; a volume at line conditions is a different quantity of gas.
constexpr unit_definition normal_cubic_metre = absolute(
    "Nm3", "normal cubic metre (gas at 0 \u00B0C and 101.325 kPa)", volume, 1.0, "1",
    prefixes::refused, "DIN 1343 (from memory): a cubic metre of gas at 0 \u00B0C and 101.325 kPa");
constexpr unit_definition standard_cubic_metre =
    absolute("Sm3", "standard cubic metre (gas at 15 \u00B0C and 101.325 kPa)", volume, 1.0, "1",
             prefixes::refused,
             "ISO 13443 (from memory): a cubic metre of gas at 15 \u00B0C and 101.325 kPa");
constexpr unit_definition ton_of_refrigeration =
    absolute("TR", "ton of refrigeration (12 000 Btu/h)", power, 52752792631.0 / 15000000.0,
             "52752792631/15000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 3.516853E+03; exact as 12 000 Btu_IT/h");

constexpr unit_definition pound_per_square_inch =
    absolute("psi", "pound-force per square inch", pressure, 8896443230521.0 / 1290320000.0,
             "8896443230521/1290320000", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 6.894757E+03; exact as lbf/in²");

constexpr unit_definition rows[] = {
    // SI base units. Prefixes go on the gram, never on the kilogram (SI Brochure 9th ed.,
    // section 3), so "kg" refuses them and "g" is a row of its own. "kg" also reads as k + g;
    // both readings mean the same mass.
    absolute("m", "metre", length, 1.0, "1", prefixes::accepted, si_base),
    absolute("kg", "kilogram", mass, 1.0, "1", prefixes::refused, si_base),
    absolute("g", "gram", mass, 1e-3, "0.001", prefixes::accepted,
             "SI Brochure 9th ed., Table 2 and section 3 (prefixes attach to the gram)"),
    absolute("s", "second", time, 1.0, "1", prefixes::accepted, si_base),
    absolute("A", "ampere", dims(0, 0, 0, 0, 0, 1), 1.0, "1", prefixes::accepted, si_base),
    // A battery's charge: 1 A·h = 3600 C (SI Brochure 9th ed., Table 8, the hour; common
    // practice for cells and packs, mAh and kAh too).
    absolute("Ah", "ampere hour", dims(0, 0, 1, 0, 0, 1), 3600.0, "3600", prefixes::accepted,
             "SI Brochure 9th ed., Table 8 (h = 3600 s): 1 A\u00B7h = 3600 C"),
    absolute("K", "kelvin", temperature, 1.0, "1", prefixes::accepted, si_base),
    absolute("mol", "mole", dims(0, 0, 0, 0, 1), 1.0, "1", prefixes::accepted, si_base),
    absolute("cd", "candela", dims(0, 0, 0, 0, 0, 0, 1), 1.0, "1", prefixes::accepted, si_base),

    // The 22 SI derived units with special names, in base units.
    absolute("rad", "radian", none, 1.0, "1", prefixes::accepted, si_derived),
    absolute("sr", "steradian", none, 1.0, "1", prefixes::accepted, si_derived),
    absolute("Hz", "hertz", per_time, 1.0, "1", prefixes::accepted, si_derived),
    absolute("N", "newton", force, 1.0, "1", prefixes::accepted, si_derived),
    absolute("Pa", "pascal", pressure, 1.0, "1", prefixes::accepted, si_derived),
    absolute("J", "joule", energy, 1.0, "1", prefixes::accepted, si_derived),
    absolute("W", "watt", power, 1.0, "1", prefixes::accepted, si_derived),
    absolute("C", "coulomb", dims(0, 0, 1, 0, 0, 1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("V", "volt", dims(1, 2, -3, 0, 0, -1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("F", "farad", dims(-1, -2, 4, 0, 0, 2), 1.0, "1", prefixes::accepted, si_derived),
    ohm,
    // Both the Greek capital omega and the ohm sign reach keyboards; "ohm" is for ASCII files.
    spelled("\u2126", ohm),
    spelled("ohm", ohm),
    absolute("S", "siemens", dims(-1, -2, 3, 0, 0, 2), 1.0, "1", prefixes::accepted, si_derived),
    absolute("Wb", "weber", dims(1, 2, -2, 0, 0, -1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("T", "tesla", dims(1, 0, -2, 0, 0, -1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("H", "henry", dims(1, 2, -2, 0, 0, -2), 1.0, "1", prefixes::accepted, si_derived),
    degree_celsius,
    spelled("degC", degree_celsius),
    spelled("\u2103", degree_celsius),
    // lm = cd·sr and lx = cd·sr/m²; the steradian is dimensionless.
    absolute("lm", "lumen", dims(0, 0, 0, 0, 0, 0, 1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("lx", "lux", dims(0, -2, 0, 0, 0, 0, 1), 1.0, "1", prefixes::accepted, si_derived),
    absolute("Bq", "becquerel", per_time, 1.0, "1", prefixes::accepted, si_derived),
    absolute("Gy", "gray", specific_energy, 1.0, "1", prefixes::accepted, si_derived),
    absolute("Sv", "sievert", specific_energy, 1.0, "1", prefixes::accepted, si_derived),
    absolute("kat", "katal", dims(0, 0, -1, 0, 1), 1.0, "1", prefixes::accepted, si_derived),

    // Non-SI units accepted for use with the SI. The neper, bel and decibel are left out: they
    // name the logarithm of a ratio, so no factor times the value gives an SI quantity.
    // The unified atomic mass unit "u" is left out too: "u" is the ASCII micro prefix here.
    absolute("min", "minute", time, 60.0, "60", prefixes::refused, si_accepted),
    absolute("h", "hour", time, 3600.0, "3600", prefixes::refused, si_accepted),
    day,
    spelled("day", day),
    // Annual energy, emissions and running hours: the year of 365 days (NIST SP 811 (2008),
    // B.8, 3.1536E+07 s), the 8760 h of the trades; "a" (annum) as ISO 80000-3 writes it.
    year,
    spelled("a", year),
    absolute("au", "astronomical unit", length, 149597870700.0, "149597870700", prefixes::refused,
             si_accepted),
    angle_degree,
    spelled("deg", angle_degree),
    angle_minute,
    spelled("arcmin", angle_minute),
    angle_second,
    spelled("arcsec", angle_second),
    absolute("ha", "hectare", area, 1e4, "10000", prefixes::refused, si_accepted),
    litre,
    spelled("l", litre),
    absolute("t", "tonne", mass, 1e3, "1000", prefixes::accepted, si_accepted),
    // Measured, not defined: CODATA 2018 (from memory), standard uncertainty 5.0E-37 kg.
    absolute("Da", "dalton", mass, 1.66053906660e-27, "1.66053906660e-27", prefixes::accepted,
             "SI Brochure 9th ed., Table 8; value CODATA 2018 (measured)"),
    absolute("eV", "electronvolt", energy, 1.602176634e-19, "1.602176634e-19", prefixes::accepted,
             si_accepted),

    // Length. "ft" also reads as femto + tonne; the exact row wins, and nobody writes a
    // femtotonne. "mi", "nmi" and "min" have no prefix reading: the inch and mile refuse
    // prefixes.
    absolute("ft", "foot", length, 0.3048, "0.3048", prefixes::refused, nist),
    absolute("in", "inch", length, 0.0254, "0.0254", prefixes::refused, nist),
    absolute("yd", "yard", length, 0.9144, "0.9144", prefixes::refused, nist),
    absolute("mi", "mile (international)", length, 1609.344, "1609.344", prefixes::refused, nist),
    absolute("nmi", "nautical mile (international)", length, 1852.0, "1852", prefixes::refused,
             nist),
    absolute("mil", "mil (0.001 in)", length, 2.54e-5, "0.0000254", prefixes::refused, nist),
    // Conductor tables give ohms per 1000 ft ("Ω/kft"); the foot takes no SI prefixes.
    absolute("kft", "thousand feet", length, 304.8, "304.8", prefixes::refused,
             "1000 ft, NIST SP 811 (2008), B.8; the spelling is common practice"),

    // Area. The digit suffix spells the power because a symbol row cannot hold "ft^2"; the
    // expression "ft^2" means the same and is resolved by the checker.
    absolute("ft2", "square foot", area, 0.09290304, "0.09290304", prefixes::refused, nist),
    absolute("in2", "square inch", area, 6.4516e-4, "0.00064516", prefixes::refused, nist),
    // The area of a circle one mil across: conductor sizes (kcmil, the older MCM).
    absolute("cmil", "circular mil", area, pi / 4.0 * 6.4516e-10, "pi/4*6.4516e-10",
             prefixes::refused, "NIST SP 811 (2008), B.8 (5.067075E-10 m^2; pi/4 mil^2)"),
    absolute("kcmil", "thousand circular mils", area, pi / 4.0 * 6.4516e-7, "pi/4*6.4516e-7",
             prefixes::refused, "1000 cmil, NIST SP 811 (2008), B.8; common practice"),
    absolute("MCM", "thousand circular mils (older spelling)", area, pi / 4.0 * 6.4516e-7,
             "pi/4*6.4516e-7", prefixes::refused, "1000 cmil; common practice"),
    // Defined on the U.S. survey foot (1200/3937 m), so no short exact decimal exists.
    absolute("acre", "acre (U.S. survey foot)", area, 4046.873, "4046.873", prefixes::refused,
             "NIST SP 811 (2008), B.8 (rounded)"),
    darcy,
    spelled("darcy", darcy),
    millidarcy,
    // Oilfield reports write the millidarcy "md"; the day takes no prefixes, so nothing else
    // reads that way.
    spelled("md", millidarcy),

    // Volume.
    absolute("ft3", "cubic foot", volume, 0.028316846592, "0.028316846592", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 2.831685E-02; exact as (0.3048 m)^3"),
    absolute("in3", "cubic inch", volume, 1.6387064e-5, "0.000016387064", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 1.638706E-05; exact as (0.0254 m)^3"),
    absolute("gal", "gallon (U.S.)", volume, 0.003785411784, "0.003785411784", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 3.785412E-03; exact as 231 in^3"),
    absolute("bbl", "barrel (oil, 42 U.S. gal)", volume, 0.158987294928, "0.158987294928",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 1.589873E-01; exact as 42 gal"),
    // A dehumidifier's pints a day, not picotonnes: no trade weighs in pt.
    absolute("pt", "pint (U.S. liquid)", volume, 0.000473176473, "0.000473176473",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 4.731765E-04; exact as gal/8"),
    absolute("qt", "quart (U.S. liquid)", volume, 0.000946352946, "0.000946352946",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 9.463529E-04; exact as gal/4"),

    // Mass.
    pound_mass,
    // Steam and boiler sheets: thousands of pounds (klb/h), common practice.
    absolute("klb", "thousand pounds (avoirdupois)", mass, 453.59237, "453.59237",
             prefixes::refused, "NIST SP 811 (2008), B.8 pound 0.45359237 kg, exact, × 1000"),
    spelled("lbm", pound_mass),
    // The grain, 1/7000 lb, in which psychrometric charts give moisture (gr/lb).
    absolute("gr", "grain", mass, 0.00006479891, "0.00006479891", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 6.479891E-05; exact as 1/7000 lb"),
    // The ounce of hop and malt additions and of dosing sheets (oz per barrel), 1/16 lb.
    absolute("oz", "ounce (avoirdupois)", mass, 0.028349523125, "0.028349523125", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 2.834952E-02; exact as 1/16 lb"),
    // The pound-mole of US gas and process calcs: as many particles as 1 lb of carbon-12 over
    // 12 g (the mole of lb), 453.59237 mol exactly from the pound's definition (NIST SP 811
    // (2008), B.8, pound; the unit is common practice).
    absolute("lbmol", "pound-mole", dims(0, 0, 0, 0, 1), 453.59237, "453.59237", prefixes::refused,
             "common practice: 1 lbmol = 453.59237 mol, as 1 lb = 0.45359237 kg"),
    absolute("slug", "slug", mass, 8896443230521.0 / 609600000000.0, "8896443230521/609600000000",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 1.459390E+01; exact as lbf·s²/ft"),
    // "ton" alone is the U.S. short ton; the refrigeration ton is a power, "TR" below.
    absolute("ton", "ton (short, 2000 lb)", mass, 907.18474, "907.18474", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 9.071847E+02; exact as 2000 lb"),

    // Force. The pound-force is lb × standard gravity (9.80665 m/s², exact).
    absolute("lbf", "pound-force", force, 4.4482216152605, "4.4482216152605", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.448222E+00; exact as lb × 9.80665 m/s²"),
    absolute("kip", "kip (1000 lbf)", force, 4448.2216152605, "4448.2216152605", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.448222E+03; exact as 1000 lbf"),
    // Line loads on US framing drawings: pounds-force and kips per linear foot (common
    // practice; NIST SP 811 (2008), B.8: 1 lbf = 4.448222 N, 1 ft = 0.3048 m, exact).
    absolute("plf", "pound-force per linear foot", dims(1, 0, -2), 4.4482216152605 / 0.3048,
             "44482216152605/3048000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8, lbf/ft, exact"),
    absolute("klf", "kip per linear foot", dims(1, 0, -2), 4448.2216152605 / 0.3048,
             "44482216152605/3048000000", prefixes::refused,
             "NIST SP 811 (2008), B.8, 1000 lbf/ft, exact"),
    absolute("kgf", "kilogram-force", force, 9.80665, "9.80665", prefixes::refused, nist),

    // Pressure.
    pound_per_square_inch,
    // "psia" says explicitly what "psi" means anyway: absolute pressure.
    spelled("psia", pound_per_square_inch),
    gauge("psig", "pound-force per sq. inch, gauge", pound_per_square_inch.factor,
          pound_per_square_inch.exact_factor,
          "NIST SP 811 (2008), B.8 (psi)"
          "; common practice: standard atmosphere as the reference; local atmospheric "
          "pressure differs"),
    // "kpsi" is not a row: the trade writes "ksi", and prefixes never attach to psi.
    absolute("ksi", "kip per square inch", pressure, 8896443230521.0 / 1290320.0,
             "8896443230521/1290320", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 6.894757E+06; exact as 1000 lbf/in²"),
    // Loads on floors, walls and soil in US practice: pounds and kips per square foot.
    absolute("psf", "pound-force per square foot", pressure, 8896443230521.0 / 185806080000.0,
             "8896443230521/185806080000", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.788026E+01; exact as lbf/ft²"),
    absolute("ksf", "kip per square foot", pressure, 8896443230521.0 / 185806080.0,
             "8896443230521/185806080", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.788026E+04; exact as 1000 lbf/ft²"),
    absolute("atm", "standard atmosphere", pressure, standard_atmosphere, "101325",
             prefixes::refused, nist),
    // The bar takes prefixes because the millibar is everyday meteorology.
    absolute("bar", "bar", pressure, 1e5, "100000", prefixes::accepted, nist),
    gauge("barg", "bar, gauge", 1e5, "100000",
          "NIST SP 811 (2008), B.8 (bar)"
          "; common practice: standard atmosphere as the reference; local atmospheric "
          "pressure differs"),
    gauge("kPag", "kilopascal, gauge", 1e3, "1000",
          "SI Brochure 9th ed., Table 4 (Pa) and Table 7 (k)"
          "; common practice: standard atmosphere as the reference; local atmospheric "
          "pressure differs"),
    // Vessels are rated in MPa(g); gas supplies to burners and meters in mbar g, and in the
    // US in inches of water column, always gauge (common practice).
    gauge("MPag", "megapascal, gauge", 1e6, "1000000",
          "SI Brochure 9th ed., Table 4 (Pa) and Table 7 (M)"
          "; common practice: standard atmosphere as the reference; local atmospheric "
          "pressure differs"),
    gauge("mbarg", "millibar, gauge", 100.0, "100",
          "NIST SP 811 (2008), B.8 (bar); SI Brochure 9th ed., Table 7 (m)"
          "; common practice: standard atmosphere as the reference; local atmospheric "
          "pressure differs"),
    torr,
    spelled("torr", torr),
    // Conventional mercury (13595.1 kg/m³) and water (1000 kg/m³) columns under standard
    // gravity; the densities are from memory, the products agree with NIST's printed digits.
    absolute("mmHg", "millimetre of mercury (conv.)", pressure, 133.322387415, "133.322387415",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 1.333224E+02; exact by convention"),
    absolute("inHg", "inch of mercury (conventional)", pressure, 3386.388640341, "3386.388640341",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 3.386389E+03; exact by convention"),
    absolute("inH2O", "inch of water (conventional)", pressure, 249.08891, "249.08891",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 2.490889E+02; exact by convention"),
    absolute("ftH2O", "foot of water (conventional)", pressure, 2989.06692, "2989.06692",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 2.989067E+03; exact by convention"),
    absolute("mmH2O", "millimetre of water (conventional)", pressure, 9.80665, "9.80665",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 9.80665 E+00; exact by convention"),
    gauge("inH2Og", "inch of water (conventional), gauge", 249.08891, "249.08891",
          "NIST SP 811 (2008), B.8 prints 2.490889E+02; exact by convention"
          "; common practice: gas piping's inches of water column are gauge, against the "
          "standard atmosphere; local atmospheric pressure differs"),

    // Energy. Steam tables use the IT calorie (common practice), so the bare "cal" means it.
    btu_it,
    spelled("Btu_IT", btu_it),
    spelled("BTU", btu_it),
    // Gas is billed in therms and traded in MMBtu; heating plant is rated in MBH (common
    // practice): 100 000 Btu (the EC therm of NIST SP 811 (2008), B.8, 1.055056E+08 J), a
    // million Btu ("MM" the trade's million, as in MMscf), a thousand Btu an hour.
    absolute("therm", "therm (100 000 Btu_IT)", energy, 105505585.262, "105505585.262",
             prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 1.055056E+08 (EC); exact as 100 000 Btu_IT"),
    absolute("MMBtu", "million Btu_IT", energy, 1055055852.62, "1055055852.62", prefixes::refused,
             "common practice (1e6 Btu_IT); NIST SP 811 (2008), B.8 Btu_IT, exact"),
    absolute("MBH", "thousand Btu_IT per hour", power, 1055055.85262 / 3600.0,
             "105505585262/360000000", prefixes::refused,
             "common practice (1000 Btu_IT/h); NIST SP 811 (2008), B.8, exact"),
    calorie_it,
    spelled("cal_IT", calorie_it),
    absolute("cal_th", "calorie (thermochemical)", energy, 4.184, "4.184", prefixes::refused, nist),
    // Calories take no prefixes, yet the kilocalorie is everywhere, so it is a row.
    absolute("kcal", "kilocalorie (IT)", energy, 4186.8, "4186.8", prefixes::refused, nist),
    absolute("kcal_th", "kilocalorie (thermochemical)", energy, 4184.0, "4184", prefixes::refused,
             "NIST SP 811 (2008), B.8 calorie (thermochemical) 4.184, exact, × 1000"),
    // A dust load's grains per actual cubic foot (common practice in baghouse sizing).
    absolute("acf", "actual cubic foot", volume, 0.028316846592, "0.028316846592",
             prefixes::refused, "NIST SP 811 (2008), B.8 cubic foot, exact, at line conditions"),
    absolute("Wh", "watt hour", energy, 3600.0, "3600", prefixes::refused, nist),
    absolute("kWh", "kilowatt hour", energy, 3.6e6, "3600000", prefixes::refused, nist),
    absolute("MWh", "megawatt hour", energy, 3.6e9, "3600000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 (kW·h) × 1000"),
    absolute("GWh", "gigawatt hour", energy, 3.6e12, "3600000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 (kW·h) × 10⁶"),
    absolute("TWh", "terawatt hour", energy, 3.6e15, "3600000000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 (kW·h) × 10⁹"),

    // Power: 550 ft·lbf/s.
    absolute("hp", "horsepower (550 ft·lbf/s)", power, 745.69987158227022, "745.69987158227022",
             prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 7.456999E+02; exact as 550 ft·lbf/s"),
    // A boiler's rating: 34.5 lb/h of water evaporated from and at 212 °F, 33 475 Btu/h as the
    // boiler makers round it (ABMA; common practice), not the brake horsepower of a shaft.
    absolute("BoHP", "boiler horsepower (33 475 Btu/h)", power, 70635989332909.0 / 7200000000.0,
             "70635989332909/7200000000", prefixes::refused,
             "common practice (ABMA, 33 475 Btu/h); Btu (IT) from NIST SP 811 (2008), B.8, exact"),

    // Temperature.
    degree_fahrenheit,
    spelled("degF", degree_fahrenheit),
    spelled("\u2109", degree_fahrenheit),
    degree_rankine,
    spelled("degR", degree_rankine),

    // Velocity.
    absolute("mph", "mile per hour", velocity, 0.44704, "0.44704", prefixes::refused, nist),
    knot,
    // Not "kt": that is the kilotonne, and a row would hide it.
    spelled("knot", knot),

    // Viscosity. "P" alone is the poise; it never reads as the peta prefix because a prefix
    // needs a unit after it.
    absolute("P", "poise", dynamic_viscosity, 0.1, "0.1", prefixes::refused, nist),
    centipoise,
    // Drilling and reservoir reports write the centipoise in lower case; "cp" has no other
    // reading (the poise refuses prefixes).
    spelled("cp", centipoise),
    absolute("St", "stokes", kinematic_viscosity, 1e-4, "0.0001", prefixes::refused, nist),
    absolute("cSt", "centistokes", kinematic_viscosity, 1e-6, "0.000001", prefixes::refused, nist),

    // Flow rates.
    absolute("gpm", "gallon (U.S.) per minute", volumetric_flow, 0.0000630901964, "0.0000630901964",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 6.309020E-05; exact as gal/min"),
    absolute("cfm", "cubic foot per minute", volumetric_flow, 0.0004719474432, "0.0004719474432",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 4.719474E-04; exact as ft^3/min"),
    absolute("cfs", "cubic foot per second", volumetric_flow, 0.028316846592, "0.028316846592",
             prefixes::refused, "NIST SP 811 (2008), B.8 prints 2.831685E-02; exact as ft^3/s"),
    // The US gas trade's meter and appliance rate (pipe sizing tables in cubic feet an hour).
    absolute("cfh", "cubic foot per hour", volumetric_flow, 0.028316846592 / 3600.0,
             "28316846592/3600000000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 cubic foot and hour; exact as ft^3/h"),
    // Compressed air and gas: standard cubic feet a minute or an hour, and actual cubic feet a
    // minute at the inlet (common practice; the standard ones at reference conditions, as scf).
    absolute("scfm", "standard cubic foot per minute", volumetric_flow, 0.0004719474432,
             "0.0004719474432", prefixes::refused, standard_volume_source),
    absolute("scfh", "standard cubic foot per hour", volumetric_flow, 0.028316846592 / 3600.0,
             "28316846592/3600000000000000", prefixes::refused, standard_volume_source),
    absolute("acfm", "actual cubic foot per minute", volumetric_flow, 0.0004719474432,
             "0.0004719474432", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 4.719474E-04; exact as ft^3/min at line conditions"),
    // Water and wastewater plants rate flow in million U.S. gallons a day (common practice).
    absolute("mgd", "million gallons (U.S.) per day", volumetric_flow, 157725491.0 / 3600000000.0,
             "157725491/3600000000", prefixes::refused,
             "common practice (1e6 gal/d); NIST SP 811 (2008), B.8 gallon (U.S.) and day, exact"),
    // And keep their energy and chemical use per million gallons (kWh/MG; common practice).
    absolute("Mgal", "million gallons (U.S.)", volume, 3785.411784, "3785.411784",
             prefixes::refused,
             "common practice (1e6 gal); NIST SP 811 (2008), B.8 gallon (U.S.), exact"),
    absolute("gal_imp", "gallon (Imperial)", volume, 0.00454609, "0.00454609", prefixes::refused,
             "NIST SP 811 (2008), B.8 gallon [Canadian and U.K. (Imperial)] 4.54609E-03, exact"),
    absolute("igpm", "gallon (Imperial) per minute", volumetric_flow, 454609.0 / 6000000000.0,
             "454609/6000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 gallon (Imperial) 4.54609E-03 per minute, exact"),

    // Rotational speed: "rpm", or the revolution over a time, "r/min", "rev/s" (common practice).
    revolution,
    spelled("rev", revolution),
    revolution_per_minute,

    // Electrical power: apparent (volt ampere) and reactive (var) power are watts to the
    // dimension; IEC 80000-6 names them (from memory).
    absolute("VA", "volt ampere (apparent power)", power, 1.0, "1", prefixes::accepted,
             "IEC 80000-6 (from memory): 1 V·A"),
    absolute("var", "var (reactive power)", power, 1.0, "1", prefixes::accepted,
             "IEC 80000-6 (from memory): 1 V·A"),
    ton_of_refrigeration,
    spelled("tonR", ton_of_refrigeration),

    // CGS mechanical units.
    absolute("dyn", "dyne", force, 1e-5, "0.00001", prefixes::refused, nist),
    absolute("erg", "erg", energy, 1e-7, "0.0000001", prefixes::refused, nist),

    // Oilfield units. "M" and "MM" are the trade's thousand and million (SPE convention), not
    // the SI mega: "Mscf" is 1000 scf. The rows spell them out so that no SI prefix reads them.
    absolute("scf", "standard cubic foot", volume, 0.028316846592, "0.028316846592",
             prefixes::refused, standard_volume_source),
    absolute("Mscf", "thousand standard cubic feet", volume, 28.316846592, "28.316846592",
             prefixes::refused, standard_volume_source),
    absolute("MMscf", "million standard cubic feet", volume, 28316.846592, "28316.846592",
             prefixes::refused, standard_volume_source),
    // Gas rates a day as the gas trade writes them, one word (common practice; the day
    // 86400 s, SI Brochure 9th ed., Table 8).
    absolute("scfd", "standard cubic foot per day", volumetric_flow, 0.028316846592 / 86400.0,
             "28316846592/86400000000000000", prefixes::refused, standard_volume_source),
    absolute("Mscfd", "thousand standard cubic feet per day", volumetric_flow,
             28.316846592 / 86400.0, "28316846592/86400000000000", prefixes::refused,
             standard_volume_source),
    absolute("MMscfd", "million standard cubic feet per day", volumetric_flow,
             28316.846592 / 86400.0, "28316846592/86400000000", prefixes::refused,
             standard_volume_source),
    stock_tank_barrel,
    spelled("stb", stock_tank_barrel),
    normal_cubic_metre,
    standard_cubic_metre,
    // As gas sheets print them, with the superscript three.
    spelled("Nm\u00B3", normal_cubic_metre),
    spelled("Sm\u00B3", standard_cubic_metre),
    // Unit weights on US drawings, soil, concrete, water and snow, in pounds-force per cubic
    // foot (common practice: 62.4 pcf for water, ASCE 7's snow at 0.13·p_g + 14 pcf); NIST SP
    // 811 (2008), B.8: lbf = 4.448222 N, ft³ = 0.02831685 m³, exact as their quotient.
    absolute("pcf", "pound-force per cubic foot (unit weight)", dims(1, -2, -2),
             4.4482216152605 / 0.028316846592, "44482216152605/283168465920", prefixes::refused,
             "NIST SP 811 (2008), B.8, lbf/ft^3, exact"),
    // Mud weight in pounds per U.S. gallon.
    absolute("ppg", "pound per gallon (U.S.)", dims(1, -3, 0), 736351250.0 / 6145149.0,
             "736351250/6145149", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 1.198264E+02; exact as lb/gal"),
    absolute("fpm", "foot per minute", velocity, 0.00508, "0.00508", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 5.08E-03; exact as ft/min"),
    // The plumbing and fire trades' feet per second and gallons an hour (common practice).
    absolute("fps", "foot per second", velocity, 0.3048, "0.3048", prefixes::refused,
             "NIST SP 811 (2008), B.8 prints 3.048E-01; exact as ft/s"),
    // Water wells and treatment: gallons a day (transmissivity in gpd/ft, common practice).
    absolute("gpd", "gallon (U.S.) per day", volumetric_flow, 0.003785411784 / 86400.0,
             "3785411784/86400000000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 gallon (U.S.) 3.785412E-03 per day; exact"),
    absolute("gph", "gallon (U.S.) per hour", volumetric_flow, 0.003785411784 / 3600.0,
             "3785411784/3600000000000000", prefixes::refused,
             "NIST SP 811 (2008), B.8 gallon (U.S.) 3.785412E-03 per hour; exact"),

    // Percent: 0.01 (SI Brochure 9th ed., 5.4.7).
    absolute("%", "percent", none, 0.01, "0.01", prefixes::refused,
             "SI Brochure 9th ed., 5.4.7 (% = 0.01)"),
    // Per mille: 0.001, common practice (gradients in railway and drainage work, 1 ‰ = 1 m/km).
    absolute("‰", "per mille", none, 0.001, "0.001", prefixes::refused,
             "common practice (‰ = 0.001)"),
    // Money, counted as a pure number (the grammar reads the signs; these rows name them in
    // the catalogue): a price per MWh beside one per kWh is still 1000 apart. Currencies are
    // not converted into one another (common practice: the rate is the calc's own input).
    absolute("$", "money (dollar), counted as a pure number", none, 1.0, "1", prefixes::refused,
             "common practice (no exchange rate is assumed)"),
    absolute("€", "money (euro), counted as a pure number", none, 1.0, "1", prefixes::refused,
             "common practice (no exchange rate is assumed)"),
    absolute("£", "money (pound sterling), counted as a pure number", none, 1.0, "1",
             prefixes::refused, "common practice (no exchange rate is assumed)"),
    absolute("¥", "money (yen or yuan), counted as a pure number", none, 1.0, "1",
             prefixes::refused, "common practice (no exchange rate is assumed)"),
    // Parts per million and per billion: 10^-6 and 10^-9 (NIST SP 811 (2008), 7.10.3, which
    // discourages them; air and water permits are written in them all the same).
    absolute("ppm", "part per million", none, 1e-6, "0.000001", prefixes::refused,
             "NIST SP 811 (2008), 7.10.3 (ppm = 10^-6)"),
    absolute("ppb", "part per billion (10^-9)", none, 1e-9, "0.000000001", prefixes::refused,
             "NIST SP 811 (2008), 7.10.3 (ppb = 10^-9)"),
};

// SI Brochure 9th ed., Table 7, plus ronna, quetta, ronto and quecto, which the 27th CGPM
// added in 2022 (Resolution 3, from memory). The micro sign U+00B5 is the canonical spelling;
// the index also accepts the Greek mu and ASCII "u".
constexpr unit_prefix prefix_rows[] = {
    {"Q", "quetta", 30}, {"R", "ronna", 27},  {"Y", "yotta", 24},  {"Z", "zetta", 21},
    {"E", "exa", 18},    {"P", "peta", 15},   {"T", "tera", 12},   {"G", "giga", 9},
    {"M", "mega", 6},    {"k", "kilo", 3},    {"h", "hecto", 2},   {"da", "deca", 1},
    {"d", "deci", -1},   {"c", "centi", -2},  {"m", "milli", -3},  {"\u00B5", "micro", -6},
    {"n", "nano", -9},   {"p", "pico", -12},  {"f", "femto", -15}, {"a", "atto", -18},
    {"z", "zepto", -21}, {"y", "yocto", -24}, {"r", "ronto", -27}, {"q", "quecto", -30},
};

} // namespace

std::span<const unit_definition> builtin_units() {
    return rows;
}
std::span<const unit_prefix> builtin_prefixes() {
    return prefix_rows;
}

} // namespace plumb::detail
