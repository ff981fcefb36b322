// Messages for every hard-error point of the A1 formula grammar.
#pragma once

#include "plumb/a1_formula.hpp"

namespace plumb::a1 {

template <typename Rule> inline constexpr const char* error_message = nullptr;

// clang-format off
template <> inline constexpr const char* error_message<string_close> = "the text in quotes has no closing '\"'";
template <> inline constexpr const char* error_message<array_close> = "the array constant has no closing '}'";
template <> inline constexpr const char* error_message<call_close> = "expected ',' or ')' in the function's argument list";
template <> inline constexpr const char* error_message<argument> = "expected an argument after ','";
template <> inline constexpr const char* error_message<group_close> = "expected ')' to close the parenthesis";
template <> inline constexpr const char* error_message<expression> = "expected an expression after '('";
template <> inline constexpr const char* error_message<negated_operand> = "expected a term after '-'";
template <> inline constexpr const char* error_message<positive_operand> = "expected a term after '+'";
template <> inline constexpr const char* error_message<power_operand> = "expected an exponent after '^'";
template <> inline constexpr const char* error_message<factor> = "expected a term after '*' or '/'";
template <> inline constexpr const char* error_message<term> = "expected a term after '+' or '-'";
template <> inline constexpr const char* error_message<joined> = "expected a term after '&'";
template <> inline constexpr const char* error_message<compared> = "expected a term after the comparison sign";
template <> inline constexpr const char* error_message<formula_body> = "expected a formula after '='";
template <> inline constexpr const char* error_message<formula_end> = "expected an operator or the end of the formula here";
// clang-format on

} // namespace plumb::a1
