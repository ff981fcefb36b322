// One-line summaries of the rules, for `plumb rules` and the README's table.
#include "plumb/rules.hpp"

#include <array>

namespace plumb::rules {

std::span<const rule_info> all() {
    static constexpr std::array<rule_info, 35> table = {{
        {syntax, "a line does not follow the notation"},
        {sum_mismatch, "the terms of a sum or difference differ in dimension"},
        {side_mismatch, "the sides of an equation or limit differ in dimension"},
        {dimensioned_argument, "a function that needs a dimensionless argument gets a dimension"},
        {dimensioned_exponent, "an exponent has a dimension"},
        {variable_exponent, "an exponent is not a constant number while its base has a dimension"},
        {argument_mismatch, "the arguments of min, max, hypot, atan2 or integral's limits differ"},
        {undeclared, "a symbol is used but not declared"},
        {unused, "a symbol is declared but never used (warning)"},
        {conflicting_declaration, "a symbol is declared twice with different dimensions"},
        {reserved_name, "a declaration uses a name the notation keeps (pi)"},
        {unknown_unit, "a declaration names a unit the table does not have"},
        {unknown_function, "a call names a function that does not exist"},
        {wrong_arity, "a function gets the wrong number of arguments"},
        {overflow, "exact exponent arithmetic would exceed 64 bits"},
        {unreadable, "a file or a `use`d dictionary cannot be read"},
        {include_cycle, "dictionaries `use` each other in a cycle"},
        {study_problem, "a study, prototype or model line cannot be worked out as written"},
        {value_mismatch, "a prototype or model value's unit disagrees with its variable"},
        {offset_scale, "a value on an offset scale (°C, °F, gauge pressure) is multiplied, divided "
                       "or raised to a power"},
        {unit_scale,
         "terms agree in dimension but not in unit, so the numbers are off by a factor"},
        {inferred_dimension, "the dimension a symbol or coefficient marked ? must have (note)"},
        {inference_conflict, "formulas disagree about the dimension of a symbol marked ?"},
        {acceptance_problem, "a `# reviewed` mark or an accepted-findings entry without a reason "
                             "or naming an unknown rule"},
        {stale_acceptance,
         "a `# reviewed` mark or an accepted-findings entry that no longer accepts anything"},
        {coefficient_mismatch, "a coefficient marked ?[...] is not the dimension or SI value "
                               "stated for it"},
        {trade_constant, "a number the trade writes for a physical property where a formula "
                         "needs a unit conversion, such as 8.34 lb/gal of water (note)"},
        {result_unit, "a workbook formula computes a dimension other than its cell's unit"},
        {mixed_range, "a workbook range holds cells of different dimensions or units"},
        {no_unit, "a workbook cell feeds formulas but has no unit (warning)"},
        {circular_reference, "workbook formulas depend on themselves"},
        {not_checked, "a workbook formula plumb cannot check, named with its cell (warning)"},
        {gravity_number, "a number in a formula is read as standard gravity in the units around "
                         "it (9.81, 32.2, the oilfield's 0.052) (note)"},
        {temperature_correction, "a rate's temperature correction θ^(T - 20) read as counting "
                                 "kelvins above a reference temperature (note)"},
        {sidecar_problem, "a cells line that names no sheet of its workbook, or stands outside a "
                          "workbook's sidecar (error)"},
    }};
    return table;
}

} // namespace plumb::rules
