// Messages for every hard-error point of the OpenFormula grammar.
#pragma once

#include "plumb/openformula.hpp"

namespace plumb::openformula {

template <typename Rule> inline constexpr const char* error_message = nullptr;

// clang-format off
template <> inline constexpr const char* error_message<reference_body> = "expected a cell such as .A1 or $Sheet2.A1 after '['";
template <> inline constexpr const char* error_message<range_end> = "expected the end of the range, such as .B5, after ':'";
template <> inline constexpr const char* error_message<reference_close> = "expected ']' to close the reference";
template <> inline constexpr const char* error_message<string_close> = "the text in quotes has no closing '\"'";
// clang-format on

} // namespace plumb::openformula
