// The PEGTL grammar of the plumb notation: the single source of truth for its syntax.
// NOTATION.md beside this folder is the reference for people; the two must agree.
//
// The grammar parses one logical line (a statement with its continuation lines); the
// library splits files into logical lines so that one bad line never hides the rest.
// Rules carry no error policy: notation_errors.hpp maps the hard-error points to messages.
#pragma once

#include "plumb/notation_leaves.hpp"

#include <tao/pegtl.hpp>

namespace plumb::notation {

using namespace tao::pegtl; // NOLINT: the grammar reads better with unqualified combinators

// --- Whitespace, comments, continuation ---------------------------------------------------
// comment, seq<one<'#'>, star<not_one<'\n'>>>, is hand-written in notation_leaves.hpp.
struct continuation : seq<one<'\\'>, star<one<' ', '\t', '\r'>>, opt<comment>, one<'\n'>> {};
struct space : one<' ', '\t', '\r'> {};
// ws, star<sor<space, continuation>>, is hand-written in notation_leaves.hpp.

// --- Names --------------------------------------------------------------------------------
// Latin-1 and Latin Extended letters without × (U+00D7) and ÷ (U+00F7); the micro sign;
// Greek, Latin Extended Additional (ṁ, ẋ) and Greek Extended. Engineers write ρ, μ, Δp, φ', ṁ.
// After the first letter a name may also hold combining marks (U+0300-U+036F), for the dot of
// Q̇ written as Q and U+0307.
// A byte of a multi-byte UTF-8 sequence: tested before decoding one, so that the ASCII byte
// after every name and operand fails without a decode (issue 12: parse speed).
struct non_ascii : at<ascii::range<'\x80', '\xFF'>> {};
struct utf8_letter : seq<non_ascii, utf8::ranges<0xB5, 0xB5, 0xC0, 0xD6, 0xD8, 0xF6, 0xF8, 0x24F,
                                                 0x370, 0x3FF, 0x1E00, 0x1EFF, 0x1F00, 0x1FFF>> {};
struct combining_mark : seq<non_ascii, utf8::range<0x300, 0x36F>> {};
struct letter : sor<ranges<'a', 'z', 'A', 'Z'>, utf8_letter> {};
struct name_char : sor<ranges<'a', 'z', 'A', 'Z', '0', '9', '_'>, utf8_letter, combining_mark> {};
// name, seq<letter, star<name_char>, star<one<'\''>>>, is hand-written in notation_leaves.hpp.

// --- Numbers ------------------------------------------------------------------------------
struct digits : plus<digit> {};
struct decimal_exponent : seq<one<'e', 'E'>, opt<one<'+', '-'>>, digits> {};
// number, seq<sor<seq<digits, opt<one<'.'>, star<digit>>>, seq<one<'.'>, digits>>,
// opt<decimal_exponent>>, is hand-written in notation_leaves.hpp.
// "2g" is a product written without its operator; say so instead of failing further on.
struct number_end : not_at<name_char> {};

// An exponent written inside a unit or a dimension: 3, -2, 0.5, (1/2), (-3/2).
struct signed_decimal : seq<opt<one<'-', '+'>>, digits, opt<one<'.'>, digits>> {};
struct fraction_close : one<')'> {};
struct fraction_body : seq<signed_decimal, star<space>, opt<one<'/'>, star<space>, must<digits>>> {
};
struct literal_exponent
    : sor<signed_decimal,
          if_must<one<'('>, star<space>, fraction_body, star<space>, fraction_close>> {};

// --- Expressions --------------------------------------------------------------------------
struct expression;

struct group_close : one<')'> {};
struct group : if_must<one<'('>, ws, expression, ws, group_close> {};

// A quantity in braces: "0.5 {m}" is half a metre, "{g_n}" standard gravity (a named
// constant, or one unit). The braces keep a unit apart from the symbols around it.
struct brace_open : one<'{'> {};
struct brace_close : one<'}'> {};
struct braced_unit;
struct dimension_factors;
struct dimensionless_mark;
// A number whose dimension the checker is to infer: "1.486?" in an empirical formula.
struct inferred_mark : one<'?'> {};
// What a reviewed coefficient is stated to be, so that a later edit that breaks it is found:
//   1.486?[L^(1/3) T^-1]            its dimension
//   0.00708?[SI 2π ± 0.1%]          its value restated in coherent SI units, within 0.1 %
//   3.33?[L^(1/2) T^-1, SI 1.84]    both; without '±' as precise as written (1.835 to 1.845)
struct stated_open : one<'['> {};
struct stated_close : one<']'> {};
struct stated_dimension : sor<dimensionless_mark, dimension_factors> {};
struct stated_pi : sor<utf8::one<0x3C0>, seq<TAO_PEGTL_STRING("pi"), not_at<name_char>>> {};
struct stated_number : seq<number, opt<star<space>, opt<one<'*'>, star<space>>, stated_pi>> {};
struct plus_minus : sor<utf8::one<0xB1>, TAO_PEGTL_STRING("+-")> {};
struct stated_percent : one<'%'> {};
struct stated_tolerance_number : number {};
struct stated_tolerance : if_must<seq<star<space>, plus_minus>, star<space>,
                                  stated_tolerance_number, opt<star<space>, stated_percent>> {};
struct si_keyword : seq<TAO_PEGTL_STRING("SI"), not_at<name_char>> {};
struct stated_value : if_must<si_keyword, star<space>, stated_number, opt<stated_tolerance>> {};
struct stated_more : if_must<seq<star<space>, one<','>>, star<space>, stated_value> {};
struct stated_body : sor<stated_value, seq<stated_dimension, opt<stated_more>>> {};
struct coefficient_statement
    : if_must<stated_open, star<space>, stated_body, star<space>, stated_close> {};
struct number_term
    : seq<number, must<number_end>,
          opt<sor<seq<star<space>, braced_unit>, seq<inferred_mark, opt<coefficient_statement>>>>> {
};
struct quantity_term : seq<braced_unit> {};

// A name followed by '(' is a function call; the name is read once either way.
struct symbol : name {};
struct call_open : one<'('> {};
struct call_close : one<')'> {};
struct argument : seq<expression> {};
struct next_argument : if_must<one<','>, ws, argument> {};
struct call_arguments
    : seq<call_open, ws, opt<argument, star<ws, next_argument>>, ws, must<call_close>> {};
// call_ahead (notation_leaves.hpp) tells a call from a name before the call's rule is entered.
struct symbol_or_call : seq<symbol, opt<call_ahead, star<space>, call_arguments>> {};

// `pi` and `π` are names to the grammar; the parser makes them the number. The alternatives
// start with different bytes (a letter, a digit or '.', '(', '{'), so their order changes no
// parse: the commonest come first (issue 12: parse speed). The number and the group are each
// entered only at their first byte: both are recursive rules, so a call that fails otherwise.
struct primary
    : sor<symbol_or_call, seq<number_ahead, number_term>, seq<at<one<'('>>, group>, quantity_term> {
};

// Each operator's tail is tried after every operand and mostly fails at its first byte; the
// parser's action is on the part after the operator ("_rest"), which once entered never
// fails, so the failing attempt sets no mark for an action (issue 12: parse speed).
// The blanks after an operand are read once, by power, right after its primary: every unary
// ends with them read, so the operator tails that follow test their first byte at once. No
// operand's own rule takes them in, so no node's range holds them.
struct unary;
struct power_operand : seq<unary> {};
struct power_rest : seq<ws, must<power_operand>> {};
struct power_tail : seq<one<'^'>, power_rest> {};
struct power : seq<primary, ws, opt<power_tail>> {};
struct negated_operand : seq<unary> {};
struct negation : seq<one<'-'>, ws, must<negated_operand>> {};
struct positive_operand : seq<unary> {};
struct positive : seq<one<'+'>, ws, must<positive_operand>> {};
// A power cannot start with '-' or '+', so trying it first changes no parse (issue 12).
struct unary : sor<power, negation, positive> {};

struct multiply_sign : sor<one<'*'>, seq<non_ascii, utf8::one<0xB7, 0xD7, 0x22C5>>> {}; // * · × ⋅
struct factor : unary {};
// "x**2" is another notation's power; point at it rather than at the second '*'.
struct single_star : not_at<one<'*'>> {};
struct multiply_rest : seq<must<single_star>, ws, must<factor>> {};
struct multiply_tail : seq<multiply_sign, multiply_rest> {};
struct divide_rest : seq<ws, must<factor>> {};
struct divide_tail : seq<one<'/'>, divide_rest> {};
struct product : seq<unary, star<sor<multiply_tail, divide_tail>>> {};

struct term : product {};
struct add_rest : seq<ws, must<term>> {};
struct add_tail : seq<one<'+'>, add_rest> {};
struct subtract_rest : seq<ws, must<term>> {};
struct subtract_tail : seq<one<'-'>, subtract_rest> {};
struct expression : seq<product, star<sor<add_tail, subtract_tail>>> {};

// --- Formulas: equations and limits -------------------------------------------------------
struct less_equal : sor<TAO_PEGTL_STRING("<="), seq<non_ascii, utf8::one<0x2264>>> {};
struct greater_equal : sor<TAO_PEGTL_STRING(">="), seq<non_ascii, utf8::one<0x2265>>> {};
struct less : one<'<'> {};
struct greater : one<'>'> {};
struct equal : one<'='> {};
// '=' starts no other sign, so trying the commonest sign first changes no parse (issue 12).
struct relation_sign : sor<equal, less_equal, greater_equal, less, greater> {};

struct side : expression {};
struct first_side : expression {};
struct relation : seq<relation_sign, ws, must<side>> {};
struct label_name : plus<sor<name_char, one<'-', '.'>>> {};
struct label : if_must<one<'@'>, label_name, plus<space>> {};
struct formula : seq<opt<label>, ws, first_side, ws, must<relation>, star<ws, relation>> {};

// --- Dimensions in brackets: [M L^-3] -----------------------------------------------------
struct base_mass : one<'M'> {};
struct base_length : one<'L'> {};
struct base_temperature : sor<TAO_PEGTL_STRING("Th"), utf8::one<0x398>> {};
struct base_time : one<'T'> {};
struct base_amount : one<'N'> {};
struct base_current : one<'I'> {};
struct base_luminous : one<'J'> {};
struct base_symbol : seq<sor<base_mass, base_length, base_temperature, base_time, base_amount,
                             base_current, base_luminous>,
                         not_at<name_char>> {};
struct dimension_exponent : literal_exponent {};
struct dimension_factor
    : seq<base_symbol, opt<star<space>, one<'^'>, star<space>, must<dimension_exponent>>> {};
struct dimension_separator : sor<plus<space>, seq<star<space>, multiply_sign, star<space>>> {};
struct dimension_factors : list<dimension_factor, dimension_separator> {};
struct dimensionless_mark : sor<one<'-'>, seq<one<'1'>, not_at<digit>>> {};
struct dimension_close : one<']'> {};
struct dimension_brackets
    : if_must<one<'['>, star<space>, opt<sor<dimensionless_mark, dimension_factors>>, star<space>,
              dimension_close> {};

// --- Units: kg/m^3, W/(m*K), m^3/s, m³/h, kN m ----------------------------------------------
struct unit_expression;
// "psi(g)", "kPa(a)": the trade's marks for a gauge or an absolute reading, kept with the symbol.
struct gauge_mark : seq<one<'('>, one<'g', 'a'>, one<')'>> {};
// "kPa g", "bar a", "kPa abs": the same marks as sheets and nameplates print them, after a space
// and last in the unit. Read as a product, "kPa g" would be kilopascal times gram, and a gas law
// on gauge readings declared so would pass unseen.
struct spaced_reading_mark_end : sor<eolf, one<'"', '=', '#', '}', ',', ')'>> {};
struct spaced_reading_mark : seq<plus<blank>, sor<TAO_PEGTL_STRING("abs"), one<'g', 'a'>>,
                                 not_at<name_char>, at<star<blank>, spaced_reading_mark_end>> {};
// "°" alone is the angle degree; "°C", "°F" are symbols that start with it. "° C" with a
// space would read as degree times coulomb, so it is refused with a message.
struct no_spaced_degree_scale : not_at<plus<space>, one<'C', 'F'>, not_at<name_char>> {};
// "deg C", "deg F": the temperature scales as typed where ° is not on the keyboard (read as
// a product they would be an angle times a coulomb or a farad).
struct spaced_degree_scale
    : seq<TAO_PEGTL_STRING("deg"), plus<blank>, one<'C', 'F'>, not_at<name_char>> {};
struct unit_symbol : sor<spaced_degree_scale,
                         seq<opt<utf8::one<0xB0>>, letter, star<sor<name_char, one<'%'>>>,
                             opt<sor<gauge_mark, spaced_reading_mark>>>,
                         seq<utf8::one<0xB0>, must<no_spaced_degree_scale>>> {};
// "Nm³", "Sm³": the gas trades' normal and standard cubic metres as sheets print them, one
// symbol (not "Nm" cubed, which would read as newton metres).
struct gas_volume_symbol : seq<one<'N', 'S'>, one<'m'>, utf8::one<0xB3>, not_at<name_char>> {};
struct unit_percent : one<'%'> {};
// "‰", per mille: railway and drainage gradients (1 ‰ = 1 m/km), salinity.
struct unit_per_mille : utf8::one<0x2030> {};
// "$", "€", "£", "¥": money, counted as a pure number (a price per kWh against one per MWh is
// then still a factor of 1000 apart).
struct unit_currency : utf8::one<'$', 0x20AC, 0xA3, 0xA5> {};
struct unit_one : seq<one<'1'>, not_at<digit>> {};
struct unit_group_close : one<')'> {};
struct unit_group : if_must<one<'('>, star<space>, unit_expression, star<space>, unit_group_close> {
};
// "Δ°C": a difference on an offset scale, an ordinary quantity (1 Δ°C = 1 K).
struct unit_difference : seq<utf8::one<0x394>, unit_symbol> {};
struct unit_primary : sor<unit_group, unit_one, unit_percent, unit_per_mille, unit_currency,
                          unit_difference, gas_volume_symbol, unit_symbol> {};
struct unit_exponent : literal_exponent {};
// Exponents as documents print them: m², s⁻¹, m³/h.
struct superscript_sign : utf8::one<0x207B, 0x207A> {};
struct superscript_digit
    : utf8::one<0x2070, 0xB9, 0xB2, 0xB3, 0x2074, 0x2075, 0x2076, 0x2077, 0x2078, 0x2079> {};
struct superscript_exponent : seq<opt<superscript_sign>, plus<superscript_digit>> {};
struct unit_power
    : seq<unit_primary, opt<sor<seq<star<space>, one<'^'>, star<space>, must<unit_exponent>>,
                                superscript_exponent>>> {};
struct unit_factor : unit_power {};
struct unit_multiply : seq<star<space>, multiply_sign, star<space>, must<unit_factor>> {};
struct unit_divide : seq<star<space>, one<'/'>, star<space>, must<unit_factor>> {};
// A space multiplies too, as printed: "kN m", "W/(m^2 K)". It never takes the words that may
// follow a unit: "zero at" in a measure line (a description or '=' cannot start a unit).
struct origin_words
    : seq<TAO_PEGTL_STRING("zero"), plus<space>, TAO_PEGTL_STRING("at"), not_at<name_char>> {};
struct unit_after_space : sor<letter, utf8::one<0xB0, 0x394>, one<'('>> {};
struct spaced_unit_factor : unit_power {};
struct unit_spaced_multiply
    : seq<plus<space>, at<unit_after_space>, not_at<origin_words>, must<spaced_unit_factor>> {};
struct unit_expression
    : seq<unit_power, star<sor<unit_multiply, unit_divide, unit_spaced_multiply>>> {};
struct braced_unit : if_must<brace_open, star<space>, unit_expression, star<space>, brace_close> {};

// --- Declarations -------------------------------------------------------------------------
struct declared_name : name {};
struct next_declared_name : if_must<one<','>, ws, declared_name> {};
struct name_list : seq<declared_name, star<ws, next_declared_name>> {};
// "X : ?" declares a symbol whose dimension the checker infers from the formulas.
struct unknown_dimension : one<'?'> {};
struct declaration_spec : sor<unknown_dimension, dimension_brackets, unit_expression> {};
struct constant_value : seq<opt<one<'-'>>, number, must<number_end>> {};
struct constant_assignment : if_must<one<'='>, ws, constant_value> {};
struct description_close : one<'"'> {};
struct description_text : star<not_one<'"', '\n'>> {};
struct description : if_must<one<'"'>, description_text, description_close> {};
// The lookahead that tells a declaration from a formula; a missing name after a comma still
// counts, so that name_list can say what is missing.
struct declaration_head : seq<name, star<ws, one<','>, ws, opt<name>>, ws, one<':'>> {};
// A cheap first test: a declaration starts with the bytes its names, commas and blanks are
// made of, up to its ':'. Most lines are formulas, and this turns them away at their first
// operator or '=', before any name is read (issue 12). declaration_head_bytes is hand-written
// in notation_leaves.hpp; it stands before the declaration in statement, so that a formula
// never enters the rule the parser's action is on.
struct declaration : seq<at<declaration_head>, name_list, ws, one<':'>, ws, must<declaration_spec>,
                         opt<ws, constant_assignment>, opt<ws, description>> {};

// --- Units of one's own --------------------------------------------------------------------
//   measure mgd = 1e6 gal/d "million US gallons per day"
//   measure kPag = kPa zero at 101.325 kPa      (a gauge or offset scale: reads zero there)
struct measure_keyword : TAO_PEGTL_STRING("measure") {};
struct new_unit_name : seq<opt<utf8::one<0xB0>>, letter, star<sor<name_char, one<'%'>>>> {};
// "measure spm = 1/min": a 1 before a slash begins the unit, as in a declaration.
struct new_unit_size : seq<number, must<number_end>, star<space>, not_at<one<'/'>>> {};
struct origin_number : seq<opt<one<'-'>>, number, must<number_end>> {};
struct origin_value : seq<origin_number, star<space>, must<unit_expression>> {};
struct origin_clause
    : seq<plus<space>, TAO_PEGTL_STRING("zero"), plus<space>, TAO_PEGTL_STRING("at"),
          not_at<name_char>, star<space>, must<origin_value>> {};
struct new_unit_value : seq<opt<new_unit_size>, unit_expression, opt<origin_clause>> {};
struct measure_statement : seq<at<measure_keyword, plus<space>, new_unit_name, ws, one<'='>>,
                               measure_keyword, plus<space>, new_unit_name, ws, one<'='>, ws,
                               must<new_unit_value>, opt<ws, description>> {};
// The spelling before "measure"; kept only to say what to write instead.
struct retired_unit_keyword : failure {};
struct retired_unit_statement
    : seq<at<TAO_PEGTL_STRING("unit"), plus<space>, new_unit_name, ws, one<'='>>,
          must<retired_unit_keyword>> {};

// --- Shared dictionaries: use "path" ------------------------------------------------------
struct use_path_text : star<not_one<'"', '\n'>> {};
struct use_path_close : one<'"'> {};
struct use_path : if_must<one<'"'>, use_path_text, use_path_close> {};
struct use_statement : seq<TAO_PEGTL_STRING("use"), plus<space>, at<one<'"'>>, use_path> {};

// --- Studies: the variables of one phenomenon, for its dimensionless groups ---------------
//   study drag: F_D depends on ρ, V, D, μ repeating ρ, V, D
//   study pump: H, P depend on Q, N, D, ρ, μ
struct study_name : label_name {};
struct list_separator : seq<ws, one<','>, ws> {};
struct study_variable : name {};
struct study_dependent : name {};
struct depends_on : seq<TAO_PEGTL_STRING("depend"), opt<one<'s'>>, plus<space>,
                        TAO_PEGTL_STRING("on"), not_at<name_char>> {};
struct dependents_clause : seq<at<list<name, list_separator>, plus<space>, depends_on>,
                               list<study_dependent, list_separator>, plus<space>, depends_on, ws> {
};
// "F ~ a, b" was the separator before "depends on"; say so where the '~' stands.
struct no_tilde : not_at<one<'~'>> {};
struct retired_tilde : seq<at<name, ws, one<'~'>>, name, ws, must<no_tilde>> {};
struct study_variables : list_must<study_variable, list_separator> {};
struct repeating_variable : name {};
struct repeating_variables : list_must<repeating_variable, list_separator> {};
struct repeating_clause
    : if_must<seq<plus<space>, TAO_PEGTL_STRING("repeating"), plus<space>>, repeating_variables> {};
struct study_colon : one<':'> {};
struct study_statement : seq<at<TAO_PEGTL_STRING("study"), plus<space>, label_name, ws, one<':'>>,
                             TAO_PEGTL_STRING("study"), plus<space>, study_name, ws, study_colon,
                             ws, opt<dependents_clause>, opt<retired_tilde>, must<study_variables>,
                             opt<repeating_clause>> {};

// --- Prototype and model values for a study -----------------------------------------------
//   prototype spillway: Q = 2500 m^3/s, H = 6.5 m
//   model spillway: scale = 1:40, ρ = 998 kg/m^3
struct value_number : seq<opt<one<'-'>>, number> {};
struct value_unit : unit_expression {};
struct value_quantity : seq<value_number, must<number_end>, opt<plus<space>, value_unit>> {};
struct value_name : name {};
struct value_assignment : seq<value_name, ws, one<'='>, ws, must<value_quantity>> {};
struct scale_ratio : seq<digits, opt<one<'.'>, digits>, star<space>, one<':'>, star<space>, digits,
                         opt<one<'.'>, digits>> {};
struct scale_number : seq<digits, opt<one<'.'>, star<digit>>, opt<decimal_exponent>> {};
struct scale_value : sor<scale_ratio, scale_number> {};
struct scale_assignment : seq<TAO_PEGTL_STRING("scale"), ws, one<'='>, ws, must<scale_value>> {};
// Which groups the model must match: by the number's name, its symbol or its π label, and how
// closely a model value must agree to count as matched.
//   model hull: scale = 1:30, match Froude
//   model pipe: scale = 1:4, match Reynolds and Froude within 0.5 %
struct match_keyword_end : not_at<name_char> {};
struct match_word
    : seq<not_at<sor<TAO_PEGTL_STRING("and"), TAO_PEGTL_STRING("within")>, match_keyword_end>,
          name> {};
struct match_target : list<match_word, plus<space>> {};
struct match_targets
    : seq<match_target,
          star<plus<space>, TAO_PEGTL_STRING("and"), plus<space>, must<match_target>>> {};
struct tolerance_percent : seq<digits, opt<one<'.'>, star<digit>>> {};
struct percent_sign : one<'%'> {};
struct match_tolerance : if_must<seq<plus<space>, TAO_PEGTL_STRING("within"), plus<space>>,
                                 tolerance_percent, ws, percent_sign> {};
struct match_clause : seq<TAO_PEGTL_STRING("match"), plus<space>, not_at<one<'='>>,
                          must<match_targets>, opt<match_tolerance>> {};
struct case_item : sor<scale_assignment, match_clause, value_assignment> {};
struct case_items : list_must<case_item, list_separator> {};
struct prototype_keyword : TAO_PEGTL_STRING("prototype") {};
struct model_keyword : TAO_PEGTL_STRING("model") {};
struct case_kind : sor<prototype_keyword, model_keyword> {};
struct case_statement : seq<at<case_kind, plus<space>, label_name, ws, one<':'>>, case_kind,
                            plus<space>, study_name, ws, study_colon, ws, must<case_items>> {};

// --- Units of workbook cells, in a workbook's sidecar (book.cells.plumb) -------------------
//   cells Duty!C4 : kPa "suction gauge"
//   cells Duty!C4:C9 : mm
//   cells 'Pump data'!D : m^3/s          (a whole column)
// The '!' after the sheet tells this line from a declaration of a symbol named "cells".
struct cells_keyword : TAO_PEGTL_STRING("cells") {};
struct quoted_sheet_text : plus<sor<TAO_PEGTL_STRING("''"), not_one<'\'', '\n'>>> {};
struct quoted_sheet : seq<one<'\''>, quoted_sheet_text, one<'\''>> {};
struct plain_sheet : plus<sor<name_char, one<'.'>>> {};
struct cells_sheet : sor<quoted_sheet, plain_sheet> {};
struct cell_column : rep_min_max<1, 3, range<'A', 'Z'>> {};
struct cell_row : seq<range<'1', '9'>, star<digit>> {};
struct cell_corner
    : seq<opt<one<'$'>>, cell_column, opt<opt<one<'$'>>, cell_row>, not_at<name_char>> {};
struct cells_area : seq<cell_corner, opt<one<':'>, cell_corner>> {};
struct cells_colon : one<':'> {};
struct cells_spec : sor<dimension_brackets, unit_expression> {};
struct cells_statement : seq<at<cells_keyword, plus<space>, cells_sheet, one<'!'>>, cells_keyword,
                             plus<space>, cells_sheet, one<'!'>, must<cells_area>, ws,
                             must<cells_colon>, ws, must<cells_spec>, opt<ws, description>> {};

// --- One logical line ---------------------------------------------------------------------
struct keyword_statement : sor<use_statement, cells_statement, measure_statement,
                               retired_unit_statement, study_statement, case_statement> {};
// Every keyword statement starts with its keyword ("use", "unit", "cells", "measure", "model",
// "prototype", "study"): a line that starts with another byte tries none of them (issue 12).
struct keyword_initial : one<'c', 'm', 'p', 's', 'u'> {};
struct statement : sor<seq<at<keyword_initial>, keyword_statement>,
                       seq<at<declaration_head_bytes>, declaration>, formula> {};
struct line_end : seq<ws, opt<comment>, eof> {};
struct line : seq<ws, opt<statement>, must<line_end>> {};

} // namespace plumb::notation

namespace plumb::notation {
// A bare expression, for asking its dimension ("plumb dim").
struct query_end : seq<ws, opt<comment>, eof> {};
struct query : seq<ws, first_side, must<query_end>> {};
} // namespace plumb::notation
