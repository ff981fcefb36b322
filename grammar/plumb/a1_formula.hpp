// The formula text stored in .xlsx files (ECMA-376 Part 1, 18.17 "Formulas"): A1 references,
// '$' absolute references, ranges, 'Sheet name'!A1, defined names and functions, with the
// spreadsheet's own operator precedence (18.17.2.2): reference, negation, percent, '^',
// '* /', '+ -', '&', comparisons. Unary minus binds tighter than '^' ("=-2^2" is 4) and '^'
// groups to the left. OpenFormula text is translated into this form before it is parsed.
#pragma once

#include <tao/pegtl.hpp>

namespace plumb::a1 {

using namespace tao::pegtl; // NOLINT: the grammar reads better with unqualified combinators

struct ws : star<one<' ', '\t', '\r', '\n'>> {};
struct name_char : sor<alnum, one<'_', '.', '\\'>, utf8::range<0x80, 0x10FFFF>> {};

// --- Operands -----------------------------------------------------------------------------
struct digits : plus<digit> {};
struct number : seq<sor<seq<digits, opt<one<'.'>, star<digit>>>, seq<one<'.'>, digits>>,
                    opt<one<'e', 'E'>, opt<one<'+', '-'>>, digits>, not_at<name_char>> {};
struct string_close : one<'"'> {};
struct string_literal : if_must<one<'"'>, star<sor<string<'"', '"'>, not_one<'"'>>>, string_close> {
};
struct error_literal
    : sor<TAO_PEGTL_STRING("#NULL!"), TAO_PEGTL_STRING("#DIV/0!"), TAO_PEGTL_STRING("#VALUE!"),
          TAO_PEGTL_STRING("#REF!"), TAO_PEGTL_STRING("#NAME?"), TAO_PEGTL_STRING("#NUM!"),
          TAO_PEGTL_STRING("#N/A")> {};
struct array_close : one<'}'> {};
struct array_constant : if_must<one<'{'>, star<not_one<'}'>>, array_close> {};

struct quoted_sheet : seq<one<'\''>, plus<sor<string<'\'', '\''>, not_one<'\''>>>, one<'\''>> {};
struct plain_sheet : seq<sor<alpha, one<'_'>, utf8::range<0x80, 0x10FFFF>>, star<name_char>> {};
struct sheet_prefix : seq<sor<quoted_sheet, plain_sheet>, one<'!'>> {};
struct column : seq<opt<one<'$'>>, rep_min_max<1, 3, alpha>> {};
struct row : seq<opt<one<'$'>>, digits> {};
struct cell : seq<column, row> {};
struct area : sor<seq<cell, opt<one<':'>, cell>>, seq<column, one<':'>, column>> {};
// A reference is matched whole (its action reads its parts), so "LOG10(" is a call, not the
// cell LOG10, and "Q_1" a name.
struct reference : seq<opt<sheet_prefix>, area, not_at<sor<name_char, one<'(', '!'>>>> {};

struct function_name : seq<sor<alpha, one<'_'>>, star<name_char>, at<ws, one<'('>>> {};
struct call_open : seq<ws, one<'('>> {};
struct call_close : one<')'> {};
struct expression;
struct empty_argument : at<ws, one<',', ')'>> {};
struct argument : sor<expression, empty_argument> {};
struct next_argument : if_must<one<','>, ws, argument> {};
struct call_arguments : seq<call_open, ws, opt<not_at<one<')'>>, argument, star<ws, next_argument>>,
                            ws, must<call_close>> {};
struct call : seq<function_name, call_arguments> {};
struct boolean : seq<sor<TAO_PEGTL_STRING("TRUE"), TAO_PEGTL_STRING("FALSE")>, not_at<name_char>> {
};
struct defined_name
    : seq<sor<alpha, one<'_', '\\'>, utf8::range<0x80, 0x10FFFF>>, star<name_char>> {};

struct group_close : one<')'> {};
struct group : if_must<one<'('>, ws, expression, ws, group_close> {};

struct primary : sor<number, string_literal, error_literal, array_constant, group, reference, call,
                     boolean, defined_name> {};

// --- Operators, tightest first ------------------------------------------------------------
struct prefixed;
struct negated_operand : seq<prefixed> {};
struct negation : seq<one<'-'>, ws, must<negated_operand>> {};
struct positive_operand : seq<prefixed> {};
struct positive : seq<one<'+'>, ws, must<positive_operand>> {};
struct prefixed : sor<negation, positive, primary> {};
struct percent_mark : seq<ws, one<'%'>> {};
struct postfixed : seq<prefixed, star<percent_mark>> {};

struct power_operand : postfixed {};
struct power_tail : seq<ws, one<'^'>, ws, must<power_operand>> {};
struct power : seq<postfixed, star<power_tail>> {};

struct factor : power {};
struct multiply_tail : seq<ws, one<'*'>, ws, must<factor>> {};
struct divide_tail : seq<ws, one<'/'>, ws, must<factor>> {};
struct product : seq<power, star<sor<multiply_tail, divide_tail>>> {};

struct term : product {};
struct add_tail : seq<ws, one<'+'>, ws, must<term>> {};
struct subtract_tail : seq<ws, one<'-'>, ws, must<term>> {};
struct sum : seq<product, star<sor<add_tail, subtract_tail>>> {};

struct joined : sum {};
struct concat_tail : seq<ws, one<'&'>, ws, must<joined>> {};
struct concatenation : seq<sum, star<concat_tail>> {};

struct compared : concatenation {};
struct comparison_sign : sor<TAO_PEGTL_STRING("<>"), TAO_PEGTL_STRING("<="), TAO_PEGTL_STRING(">="),
                             one<'<'>, one<'>'>, one<'='>> {};
struct comparison_tail : seq<ws, comparison_sign, ws, must<compared>> {};
struct expression : seq<concatenation, star<comparison_tail>> {};

struct formula_body : expression {};
struct formula_end : seq<ws, eof> {};
struct formula : seq<ws, one<'='>, ws, must<formula_body>, must<formula_end>> {};

} // namespace plumb::a1
