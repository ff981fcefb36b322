// The OpenFormula text stored in .ods files (ODF 1.2 Part 2, "OpenDocument Formula", 5.8
// References; ODF 1.3 the same): references in brackets, "[.C42]", "[$Sheet2.A1]",
// "[.A1:.B5]", ';' between arguments, and an "of:" namespace prefix. plumb reads only what it
// must translate into A1 form; everything else is passed through for the A1 grammar.
#pragma once

#include <tao/pegtl.hpp>

namespace plumb::openformula {

using namespace tao::pegtl; // NOLINT: the grammar reads better with unqualified combinators

struct quote_close : one<'\''> {};
struct quoted_sheet : seq<one<'\''>, star<sor<string<'\'', '\''>, not_one<'\''>>>, quote_close> {};
struct plain_sheet : plus<not_one<'.', ']', ':', '\'', '[', '$', ' '>> {};
struct sheet_name : sor<quoted_sheet, plain_sheet> {};
struct sheet_part : seq<opt<one<'$'>>, sheet_name> {};
struct column : seq<opt<one<'$'>>, plus<alpha>> {};
struct row : seq<opt<one<'$'>>, plus<digit>> {};
struct error_reference : seq<one<'#'>, plus<sor<alpha, one<'!', '/', '?'>>>> {};
struct location : sor<seq<column, opt<row>>, row, error_reference> {};
struct cell_part : seq<opt<sheet_part>, one<'.'>, location> {};
struct range_end : cell_part {};
struct reference_body : seq<cell_part, opt<one<':'>, must<range_end>>> {};
struct reference_close : one<']'> {};
struct reference : if_must<one<'['>, reference_body, reference_close> {};

struct string_close : one<'"'> {};
struct string_literal : if_must<one<'"'>, star<sor<string<'"', '"'>, not_one<'"'>>>, string_close> {
};
struct separator : one<';'> {};
struct other : any {};
struct namespace_prefix : seq<plus<alpha>, one<':'>, at<one<'='>>> {};
struct formula : seq<opt<namespace_prefix>, opt<one<'='>>,
                     star<sor<reference, string_literal, separator, other>>, eof> {};

// A named range's address, as table:cell-range-address writes it: "$Sheet1.$B$3:.$B$9".
struct address : seq<reference_body, eof> {};

} // namespace plumb::openformula
