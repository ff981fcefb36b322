// Numbers the trades write where a formula needs a unit conversion but that are in truth a
// physical property: 8.34, the weight of a US gallon of water, stands where lb/d from mgd and
// mg/L needs 8.3454, the weight of a gallon at exactly 1 kg/L. The exact rule for rounded
// factors rejects 8.34; this table accepts it for what it is, and says so.
#pragma once

#include "plumb/rational.hpp"

#include <span>
#include <string_view>

namespace plumb {

struct trade_constant {
    std::string_view name;       // "the weight of a US gallon of water"
    std::string_view conversion; // the exact conversion it stands in for, in words
    rational exact_conversion;   // that conversion's value, or its lower bound where it is
                                 // not a 64-bit fraction
    rational conversion_high;    // its upper bound (the same where it is exact)
    // The property's published range, in the units of the conversion: the printed number must
    // lie inside it.
    rational least;
    rational greatest;
    std::string_view range_text; // "water weighs 8.31 to 8.35 lb per US gallon between 0 and 30 °C"
    std::string_view source;
    std::string_view caveat; // "the result holds for water; for another liquid ..."
};

std::span<const trade_constant> trade_constants();

// The trade constant whose published range holds a printed number (8.34 and 8.35 for water's
// weight per gallon), or null.
const trade_constant* trade_constant_for(const rational& printed);

// Hazen-Williams' coefficient in coherent SI units, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87)
// with metres and m³/s (the AWWA and ASCE manuals, from memory): the value every other form of
// the formula (4.52, 10.44, 6.05e5) restates to.
inline constexpr double hazen_williams_si = 10.67;

// Water's density between 0 and 30 °C in kg/L, the range the trades' water numbers round:
// 0.99565 at 30 °C up to 0.999975 at 4 °C (CRC Handbook of Chemistry and Physics; from memory).
rational water_density_least();
rational water_density_greatest();

} // namespace plumb
