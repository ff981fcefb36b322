// The stable ids of every rule. They appear in output and in `# expect:` comments; never
// rename one.
#pragma once

#include <span>
#include <string_view>

namespace plumb::rules {

inline constexpr std::string_view syntax = "syntax";
inline constexpr std::string_view sum_mismatch = "sum-mismatch";
inline constexpr std::string_view side_mismatch = "side-mismatch";
inline constexpr std::string_view dimensioned_argument = "dimensioned-argument";
inline constexpr std::string_view dimensioned_exponent = "dimensioned-exponent";
inline constexpr std::string_view variable_exponent = "variable-exponent";
inline constexpr std::string_view argument_mismatch = "argument-mismatch";
inline constexpr std::string_view undeclared = "undeclared";
inline constexpr std::string_view unused = "unused";
inline constexpr std::string_view conflicting_declaration = "conflicting-declaration";
inline constexpr std::string_view reserved_name = "reserved-name";
inline constexpr std::string_view unknown_unit = "unknown-unit";
inline constexpr std::string_view unknown_function = "unknown-function";
inline constexpr std::string_view wrong_arity = "wrong-arity";
inline constexpr std::string_view overflow = "overflow";
inline constexpr std::string_view unreadable = "unreadable";
inline constexpr std::string_view include_cycle = "include-cycle";
inline constexpr std::string_view study_problem = "study-problem";
inline constexpr std::string_view value_mismatch = "value-mismatch";
inline constexpr std::string_view offset_scale = "offset-scale";
inline constexpr std::string_view unit_scale = "unit-scale";
inline constexpr std::string_view inferred_dimension = "inferred-dimension";
inline constexpr std::string_view inference_conflict = "inference-conflict";
inline constexpr std::string_view acceptance_problem = "acceptance-problem";
inline constexpr std::string_view stale_acceptance = "stale-acceptance";
inline constexpr std::string_view coefficient_mismatch = "coefficient-mismatch";
inline constexpr std::string_view trade_constant = "trade-constant";
// Workbooks (.xlsx, .ods):
inline constexpr std::string_view result_unit = "result-unit";
inline constexpr std::string_view mixed_range = "mixed-range";
inline constexpr std::string_view no_unit = "no-unit";
inline constexpr std::string_view circular_reference = "circular-reference";
inline constexpr std::string_view not_checked = "not-checked";
inline constexpr std::string_view sidecar_problem = "sidecar-problem";
inline constexpr std::string_view gravity_number = "gravity-number";
inline constexpr std::string_view temperature_correction = "temperature-correction";

struct rule_info {
    std::string_view id;
    std::string_view summary;
};

// Every rule with a one-line summary, for `plumb rules` and the README.
std::span<const rule_info> all();

} // namespace plumb::rules
