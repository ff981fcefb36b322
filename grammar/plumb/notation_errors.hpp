// Messages for every hard-error point of the grammar, written for the engineer who reads
// them. Kept apart from notation.hpp so the grammar stays a plain description of the syntax.
#pragma once

#include "plumb/notation.hpp"

namespace plumb::notation {

// nullptr means "no message of its own": the parser then says "unexpected text here".
template <typename Rule> inline constexpr const char* error_message = nullptr;

// clang-format off
template <> inline constexpr const char* error_message<number_end> = "a number runs straight into a name; write a product with '*', as in 2*g";
template <> inline constexpr const char* error_message<single_star> = "'**' is not an operator here; write a power with '^', as in V^2";
template <> inline constexpr const char* error_message<negated_operand> = "expected a term after '-'";
template <> inline constexpr const char* error_message<positive_operand> = "expected a term after '+'";
template <> inline constexpr const char* error_message<power_operand> = "expected an exponent after '^'";
template <> inline constexpr const char* error_message<factor> = "expected a term after '*' or '/'";
template <> inline constexpr const char* error_message<term> = "expected a term after '+' or '-'";
template <> inline constexpr const char* error_message<expression> = "expected an expression after '('";
template <> inline constexpr const char* error_message<group_close> = "expected ')' to close the parenthesis";
template <> inline constexpr const char* error_message<call_close> = "expected ',' or ')' in the function's argument list";
template <> inline constexpr const char* error_message<argument> = "expected an argument after ','";
template <> inline constexpr const char* error_message<relation> = "expected an operator, '=' or a comparison (<, <=, >, >=) here";
template <> inline constexpr const char* error_message<side> = "expected an expression after the '=' or comparison sign";
template <> inline constexpr const char* error_message<label_name> = "expected a label name after '@', as in @darcy";
template <> inline constexpr const char* error_message<plus<space>> = "expected a space after the label";
template <> inline constexpr const char* error_message<dimension_exponent> = "expected an exponent such as 2, -3 or (1/2)";
template <> inline constexpr const char* error_message<unit_exponent> = "expected an exponent such as 2, -3 or (1/2)";
template <> inline constexpr const char* error_message<fraction_body> = "expected a number inside the parentheses, such as (1/2)";
template <> inline constexpr const char* error_message<digits> = "expected a whole number here";
template <> inline constexpr const char* error_message<fraction_close> = "expected ')' after the exponent";
template <> inline constexpr const char* error_message<dimension_close> = "expected a base dimension (M, L, T, \u0398, N, I, J) or ']'; write a quotient with negative exponents, as in [L T^-1]";
template <> inline constexpr const char* error_message<unit_expression> = "expected a unit here, such as m/s";
template <> inline constexpr const char* error_message<unit_group_close> = "expected ')' to close the unit's parenthesis";
template <> inline constexpr const char* error_message<unit_factor> = "expected a unit after '*' or '/'";
template <> inline constexpr const char* error_message<no_spaced_degree_scale> = "write \u00B0C or \u00B0F without a space; \u00B0 alone is the angle degree";
template <> inline constexpr const char* error_message<spaced_unit_factor> = "expected a unit here: a space between units multiplies them, as in kN m";
template <> inline constexpr const char* error_message<declaration_spec> = "expected a dimension such as [M L^-3], a unit such as kg/m^3, 1 for a dimensionless symbol, or ? for one to infer";
template <> inline constexpr const char* error_message<constant_value> = "expected a number after '=' (the constant's value in the stated unit)";
template <> inline constexpr const char* error_message<description_close> = "the description has no closing '\"'";
template <> inline constexpr const char* error_message<declared_name> = "expected a name after ','";
template <> inline constexpr const char* error_message<use_path_close> = "the path has no closing '\"'";
template <> inline constexpr const char* error_message<study_variables> = "expected the study's variables, separated by commas, as in: study drag: F depends on rho, V, D, mu";
template <> inline constexpr const char* error_message<no_tilde> = "a study names what depends on what in words now: write 'study drag: F depends on rho, V, D, mu' (or 'H, P depend on ...'), not '~'";
template <> inline constexpr const char* error_message<repeating_variables> = "expected the repeating variables after 'repeating', separated by commas";
template <> inline constexpr const char* error_message<study_variable> = "expected a variable name after ','";
template <> inline constexpr const char* error_message<repeating_variable> = "expected a variable name after ','";
template <> inline constexpr const char* error_message<case_items> = "expected values such as: V = 3 m/s, D = 0.5 m (and, for a model, scale = 1:25)";
template <> inline constexpr const char* error_message<case_item> = "expected a value such as V = 3 m/s, scale = 1:25, or match Froude";
template <> inline constexpr const char* error_message<value_quantity> = "expected a number and its unit, as in 3 m/s";
template <> inline constexpr const char* error_message<scale_value> = "expected the model scale as a ratio such as 1:25, or a number such as 0.04";
template <> inline constexpr const char* error_message<match_targets> = "expected the groups the model must match after 'match', as in: match Froude, or match Reynolds and Froude";
template <> inline constexpr const char* error_message<match_target> = "expected a group after 'and', such as Froude, Re or π2";
template <> inline constexpr const char* error_message<tolerance_percent> = "expected the tolerance as a percentage after 'within', as in: within 0.5 %";
template <> inline constexpr const char* error_message<percent_sign> = "expected '%' after the tolerance, as in: within 0.5 %";
template <> inline constexpr const char* error_message<brace_close> = "expected '}' to close the braces; inside them goes a unit such as m/s or a constant such as g_n";
template <> inline constexpr const char* error_message<new_unit_value> = "expected the unit's size as a number and a known unit, as in: measure mgd = 1e6 gal/d";
template <> inline constexpr const char* error_message<origin_value> = "expected where the scale reads zero, as a number and a known unit, as in: measure kPag = kPa zero at 101.325 kPa";
template <> inline constexpr const char* error_message<retired_unit_keyword> = "units of one's own are defined with 'measure' now, as in: measure mgd = 1e6 gal/d (or, for a gauge or offset scale, measure kPag = kPa zero at 101.325 kPa)";
template <> inline constexpr const char* error_message<stated_body> = "expected what the coefficient must be: a dimension such as [L^(1/3) T^-1], its value in coherent SI units such as [SI 1 \u00B1 0.1%], or both, as in [L^(1/3) T^-1, SI 1]";
template <> inline constexpr const char* error_message<stated_number> = "expected the coefficient's value in coherent SI units after 'SI', such as 1.84 or 2\u03C0";
template <> inline constexpr const char* error_message<stated_tolerance_number> = "expected a tolerance after '\u00B1', such as 0.005 or 0.1%";
template <> inline constexpr const char* error_message<stated_value> = "expected 'SI' and the coefficient's value in coherent SI units after ',', as in [L^(1/3) T^-1, SI 1]";
template <> inline constexpr const char* error_message<stated_close> = "expected ']' to close what the coefficient must be; write the dimension first, then ', SI' and the value, as in [L^(1/3) T^-1, SI 1 \u00B1 0.1%]";
template <> inline constexpr const char* error_message<cells_area> = "expected a cell, a range or a column after the sheet's '!', as in Duty!C4, Duty!C4:C9 or Duty!D (columns in capitals)";
template <> inline constexpr const char* error_message<cells_colon> = "expected ':' and the cells' unit, as in: cells Duty!C4 : kPa";
template <> inline constexpr const char* error_message<cells_spec> = "expected the cells' unit, such as kPa or m^3/s, or a dimension such as [L]";
template <> inline constexpr const char* error_message<line_end> = "expected an operator, a comparison or the end of the line here";
// clang-format on

} // namespace plumb::notation

namespace plumb::notation {
template <>
inline constexpr const char* error_message<query_end> =
    "expected an operator or the end of the expression here";
} // namespace plumb::notation
