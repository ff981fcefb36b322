// The built-in table of units: SI, non-SI accepted for use with the SI, US customary and
// oilfield units, each with its dimension and its exact relation to the coherent SI unit.
#pragma once

#include "plumb/dimension.hpp"

#include <array>
#include <cstdint>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

// How a unit's zero relates to the absolute zero of its quantity.
enum class unit_scale : std::uint8_t {
    absolute, // ratio scale: zero means none of the quantity (K, Pa, m)
    offset,   // interval scale with an arbitrary zero (°C, °F)
    gauge,    // pressure measured from the atmosphere (psig, barg)
};

// One row of the table. value_in_si = factor * value_in_unit + offset.
struct unit_definition {
    std::string_view symbol; // as written in formulas: "Pa", "°C", "lbf"
    std::string_view name;   // "pascal", "degree Celsius"
    std::array<std::int8_t, base_dimension_count> exponents; // M L T Θ N I J
    double factor;                 // SI value of one unit (for offset scales: of one degree)
    double offset;                 // SI value of the scale's zero; 0 for absolute units
    std::string_view exact_factor; // the exact factor as decimal or fraction text where the
                                   // unit is defined exactly; otherwise the published digits
                                   // (and `source` says "rounded")
    unit_scale scale;
    bool takes_prefixes;     // SI prefixes (SI Brochure 9th ed., 3) may be attached
    std::string_view source; // where the factor comes from

    [[nodiscard]] dimension dim() const;
};

// One SI prefix (SI Brochure 9th ed., Table 7).
struct unit_prefix {
    std::string_view symbol; // "k", "µ"
    std::string_view name;   // "kilo"
    int power_of_ten;        // 3, -6
};

// A unit symbol as written, resolved to a table row and an optional prefix.
struct resolved_unit {
    const unit_definition* unit = nullptr;
    const unit_prefix* prefix = nullptr; // null when none
    [[nodiscard]] double factor() const; // prefix and unit together
    [[nodiscard]] dimension dim() const { return unit->dim(); }
};

class unit_table {
  public:
    // The built-in table; built on first use.
    static const unit_table& standard();

    // Resolves "kN", "mm", "µm", "°C", "psi". An exact symbol wins over a prefix reading
    // ("min" is the minute, never milli-inch); prefixes attach only to units that take them.
    [[nodiscard]] std::optional<resolved_unit> resolve(std::string_view symbol) const;

    // Up to `limit` known symbols closest to `symbol` by edit distance, for "did you mean".
    // With `kind`, units of that dimension come first: a flow's "MD" is "mgd", not millidarcy.
    [[nodiscard]] std::vector<std::string_view>
    nearest(std::string_view symbol, std::size_t limit = 3, const dimension* kind = nullptr) const;

    [[nodiscard]] std::span<const unit_definition> units() const;
    [[nodiscard]] std::span<const unit_prefix> prefixes() const;

  private:
    unit_table();
    struct index;
    const index* index_;
};

} // namespace plumb
