// The typed-free syntax tree of one parsed file: flat arrays indexed by number, so that a
// file of a million formulas is a handful of allocations, not millions.
#pragma once

#include "model/difference_name.hpp"

#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"
#include "plumb/source.hpp"
#include "plumb/unit_table.hpp"

#include <cstdint>
#include <limits>
#include <memory>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::syntax {

inline constexpr std::uint32_t no_index = std::numeric_limits<std::uint32_t>::max();

enum class expr_kind : std::uint8_t {
    number, // range is the literal
    pi,
    symbol,   // range is the name
    negate,   // lhs
    add,      // lhs + rhs
    subtract, // lhs - rhs
    multiply,
    divide,
    power,    // lhs ^ rhs
    call,     // range starts with the function name; lhs = first index into call_args, rhs = count
    group,    // ( lhs ): kept so that messages quote terms with their parentheses
    quantity, // 0.5 {m} or {g_n}: lhs = index into quantities
    inferred, // 1.486?: a coefficient whose dimension is to be inferred; lhs = index into
              // coefficient_statements when written 1.486?[...], else no_index
    // Spreadsheet front ends only:
    reference, // a cell, a range or another operand the front end types: lhs = index into
               // references
    compare,   // lhs = rhs, lhs < rhs...: a comparison inside an expression (IF's condition)
};

// The value a spreadsheet formula refers to (a cell, a range, a looked-up column), typed by
// the front end that lowered the formula before the formula is checked.
struct reference_value {
    std::optional<dimension> dim; // empty: unknown (no unit, text, below an error): not checked
    double scale = 1.0;           // SI value of one written unit
    std::optional<rational> exact_scale;     // the same exactly, where the unit is exact
    const unit_definition* offset = nullptr; // set for °C, gauge...
    std::optional<rational> value;           // a dimensionless constant cell's exact value
    // A pressure or temperature cell whose row label says it is a difference ("Friction
    // loss", "Δp"): no reading, whatever its unit.
    bool difference = false;
    // A cell of specific energy whose row label names an enthalpy ("Outdoor air enthalpy"),
    // counted from the tables' datum as an enthalpy symbol is.
    bool enthalpy = false;
    // A pure number whose row label says it is a liquid's specific gravity.
    bool specific_gravity = false;
    // A pressure whose row label says it is a vacuum, counted down from the atmosphere.
    bool vacuum = false;
    // A pressure whose row label names a material's stress, strength or modulus (SMYS, E).
    bool stress = false;
    // A length whose row label names a circle's diameter or radius (a pulley's, a drum's).
    round_length round = round_length::none;
    // The unit as written for the cell ("Ah", "L/min"), where one is.
    std::string_view unit_text;
    // A gas volume at reference conditions (Nm³, scf): its reference temperature and the power
    // it stands in in the cell's unit; 0 where the unit names none.
    std::int8_t reference_power = 0;
    double reference_kelvins = 0.0;
    std::string_view reference_name;
};

// Which names a call may use: the notation's functions or a spreadsheet's.
enum class function_names : std::uint8_t { notation, spreadsheet };

// A number with a unit, or a named constant, inside a formula.
struct quantity_literal {
    std::optional<dimension> dim;     // empty when the unit was unknown (reported)
    double si_factor = 1.0;           // SI value of one unit (of the constant: its SI value)
    std::optional<rational> si_exact; // the same exactly, where the units are defined exactly
    const unit_definition* single_unit = nullptr; // a lone unit without prefix, for offsets
    bool constant = false;
};

// What a coefficient written "k?[...]" is stated to be.
struct coefficient_statement {
    span range;                     // the brackets
    std::optional<dimension> dim;   // its dimension, when stated
    std::optional<double> si_value; // its value in coherent SI units, when stated
    double tolerance = 0.0;         // how far the restated value may lie from si_value
    span value_text;                // "2π ± 0.1%" as written
};

struct expr_node {
    expr_kind kind;
    span range; // covers the whole subexpression, parentheses included
    std::uint32_t lhs = no_index;
    std::uint32_t rhs = no_index;
};

enum class relation_kind : std::uint8_t { none, equal, less, less_equal, greater, greater_equal };

struct formula_side {
    std::uint32_t root;
    relation_kind relation_before; // none for the first side
};

struct formula {
    span range;
    span label; // empty when the formula has none
    std::uint32_t first_side;
    std::uint32_t side_count;
    bool has_inferred = false; // holds a coefficient written "k?"
};

// What a declaration's right-hand side says, once units are resolved.
struct declared_kind {
    std::optional<dimension> dim; // empty when the spec had an error (already reported)
    double si_factor = 1.0;       // SI value of one unit of the spec; 1 for bracket dimensions
    std::optional<rational> si_exact = rational(1); // the same exactly; empty when not exact
    const unit_definition* single_unit = nullptr;   // set when the spec is one unit, no algebra
    bool by_unit = false;
    bool to_infer = false; // "X : ?"
};

struct declaration {
    span range;
    span spec;
    span description; // inside the quotes; empty when none
    span value;       // the constant's number; empty when not a constant
    declared_kind kind;
    std::uint32_t first_name;
    std::uint32_t name_count;
};

struct declared_name {
    span name;
    std::uint32_t declaration;
};

struct use_line {
    span range;
    span path; // inside the quotes
};

// study NAME: [dependents depend(s) on] variables [repeating variables]
struct study {
    span range;
    span name;
    std::uint32_t first_variable; // into study_names: dependents, variables, then repeating ones
    std::uint32_t dependent_count;
    std::uint32_t variable_count;
    std::uint32_t repeating_count;
};

// One "name = number unit" of a prototype or model line.
struct case_value {
    span name;
    span value;                   // the number and its unit as written
    std::optional<dimension> dim; // of the unit; dimensionless without one; empty on error
    double si_value = 0.0;
    bool has_unit = false;
    span unit;                // the unit as written; empty without one
    double unit_factor = 1.0; // SI value of one unit, and the SI value where its scale reads 0
    double unit_offset = 0.0;
};

// prototype NAME: values   /   model NAME: scale = 1:25, values
struct study_case {
    span range;
    span study;
    bool model = false;
    std::optional<double> scale; // model length / prototype length
    span scale_text;
    std::uint32_t first_value;
    std::uint32_t value_count;
    std::uint32_t first_match = 0; // into case_matches: the groups after "match"
    std::uint32_t match_count = 0;
    std::optional<double> tolerance; // relative, from "within 0.5 %"
    span tolerance_text;
};

// measure NAME = [number] unit [zero at number unit]: a unit of the user's own, known after
// its line in this file and in files that `use` this one.
struct defined_unit {
    // A unit with an origin of its own ("zero at"), or defined from one (0.01 barg), reads
    // from that zero: the checker's offset rules see it through this row, as they see °C.
    // Shared so that the row's address survives the file's units vector growing.
    struct scale_row {
        std::string symbol;
        std::string name;
        unit_definition row{};
    };
    std::string name;
    dimension dim;
    double si_factor = 1.0;
    span where;
    std::shared_ptr<const scale_row> origin; // null for a unit that counts from nothing
};

// cells SHEET!AREA : unit ["description"]: a unit for workbook cells, read from a sidecar.
struct cells_line {
    span range;
    span sheet; // as written, quotes included when quoted
    span area;  // "C4", "C4:C9", "D"
    span spec;
    span description;
    declared_kind kind;
};

struct parsed_file {
    const source_file* source = nullptr;
    std::vector<expr_node> nodes;
    std::vector<std::uint32_t> call_args;
    std::vector<quantity_literal> quantities;
    std::vector<coefficient_statement> coefficient_statements;
    std::vector<formula_side> sides;
    std::vector<formula> formulas;
    std::vector<declaration> declarations;
    std::vector<declared_name> names;
    std::vector<use_line> uses;
    std::vector<defined_unit> units;
    std::vector<study> studies;
    std::vector<span> study_names;
    std::vector<study_case> cases;
    std::vector<case_value> case_values;
    std::vector<span> case_matches;
    std::vector<cells_line> cells;
    std::vector<diagnostic> diagnostics; // syntax errors and unknown units
    bool has_syntax_error = false;
    std::vector<reference_value> references; // spreadsheet front ends only
    function_names functions = function_names::notation;
    // A workbook's site barometer: a number cell whose row label names the atmosphere
    // ("Site barometric pressure | 13.46 | psia"), as a declaration's description does.
    struct sheet_barometer {
        std::string cell; // "C47", or "Inputs!C47" on another sheet
        double pascals = 0.0;
        double unit = 1.0; // SI value of its unit
    };
    std::optional<sheet_barometer> barometer; // spreadsheet front ends only
};

} // namespace plumb::syntax
