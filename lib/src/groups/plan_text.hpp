// Words and numbers of a model plan: values with their units, quantity names, powers of λ.
#pragma once

#include "plumb/dimension.hpp"
#include "plumb/groups.hpp"
#include "plumb/rational.hpp"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {

bool is_length(const dimension& d);
bool is_acceleration(const dimension& d);
bool is_gravity(const group_variable& v);
bool is_dynamic_viscosity(const dimension& d);
bool is_density(const dimension& d);

// "an acceleration", "a density".
std::string_view article(std::string_view noun);
// Three significant figures by default: "0.008", "1000", "5.33", "8.43e-9", "1.25e5". Four
// where a value is read beside the plan table, which prints four.
std::string number_text(double v, int figures = 3);
// A number given by its sign and natural logarithm, however far beyond a double: "5e593".
std::string log_number_text(int sign, double natural_log);
// The coherent SI unit of a dimension, as the notation writes units ("Pa*s", "m^2/s").
std::string si_unit_text(const dimension& d);
// An SI value in the unit the user wrote, with it: "43.3 kN", "1.64 m/s"; coherent SI without one.
std::string value_text(double si, const dimension& d, const shown_unit* unit, int figures = 3);
// The first name of a dimension's quantity ("surface tension"), or "value".
std::string quantity_text(const dimension& d);
std::string power_text(rational p);
std::string join(const std::vector<std::string>& parts, std::string_view last_separator);
// sum + a * power, or nothing once any term is unknown or the exact value would overflow.
std::optional<rational> add_power(std::optional<rational> sum, rational a,
                                  std::optional<rational> power);

} // namespace plumb::planning
