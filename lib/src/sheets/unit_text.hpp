// A unit as engineers type it into a cell: "m3/s", "mm4", "m²", "kg/m³", "kPa(g)", "kPa g",
// "psig", "°C", "Δ°C", "W/(m·K)", "N·m", "L/s", "%", and "-", "1" or "—" for dimensionless.
#pragma once

#include "plumb/dimension.hpp"
#include "plumb/unit_table.hpp"

#include <optional>
#include <string>
#include <string_view>

namespace plumb::sheets {

struct written_unit {
    dimension dim;
    double scale = 1.0;                      // SI value of one unit
    std::optional<rational> exact_scale;     // the same exactly, where the unit is exact
    const unit_definition* offset = nullptr; // °C, °F or a gauge pressure
    std::string text;                        // as written in the cell
};

// The unit the whole text reads as, or empty when it does not read as one. `measures` holds the
// `measure` lines of the workbook's sidecar and dictionaries, whose units the text may use
// ("lb/lbmol" with `measure lbmol = 453.59237 mol`).
std::optional<written_unit> read_unit_text(std::string_view text, std::string_view measures = {});

// The unit in a column heading's last brackets or parentheses: "Flow [m3/s]", "D (mm)".
std::optional<written_unit> read_heading_unit(std::string_view text,
                                              std::string_view measures = {});

// The text in a column heading's last brackets or parentheses, whether or not it reads as a
// unit ("fc" in "Target [fc]"); empty where there are none.
std::optional<std::string> heading_unit_text(std::string_view text);

// Why a text does not read as a unit, in the words the notation uses for a declaration's
// unit ("unknown unit 'lbmol'; did you mean 'mol' or 'lbm'?"); empty where it gives none.
std::string unit_text_problem(std::string_view text, std::string_view measures = {});

} // namespace plumb::sheets
