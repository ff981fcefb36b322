// Infers the dimensions a file leaves open: symbols declared "X : ?" and coefficients written
// "1.486?". Every place where the checker would compare two dimensions becomes a linear
// equation in the unknown exponents; exact elimination then fixes each unknown, leaves it
// free, or shows that the formulas disagree about it.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"
#include "plumb/diagnostic.hpp"
#include "plumb/rational.hpp"

#include <array>
#include <optional>
#include <span>
#include <string>
#include <utility>
#include <vector>

namespace plumb {

// A consistent set of units other than SI, by its base units ("ft, lb, s"): a coefficient is
// restated for it too. Base dimensions not named keep their SI unit.
struct coherent_units {
    std::string label;                                                         // "ft, lb, s"
    std::array<double, base_dimension_count> base_factor{1, 1, 1, 1, 1, 1, 1}; // SI per unit
};

// The consistent set named by its base units ("ft, lb, s"; "ft, lbf, s", where a force, a
// length and a time fix the unit of mass, lbf·s²/ft): a unit for every base dimension the
// units involve, found by solving Π F_b^e_ub = f_u for the base factors F_b. Empty, with `why`
// set, when a unit is unknown or the units do not fix one unit per base dimension.
std::optional<coherent_units> coherent_units_from(const std::vector<std::string>& symbols,
                                                  std::string& why);

// Infers the dimension of every symbol declared `X : ?` and every coefficient written `k?` from
// the formulas that use them, and reports it. Diagnostics go to `out`.
//
// `formulas` should be every formula of `file` (a formula without unknowns adds nothing, but
// costs a walk); with none, the file is a dictionary and a `?` declaration nothing uses is not
// reported, as for unused symbols. Rules: "inferred-dimension" (a note for each determined
// unknown, a warning for each one left free or unused) and "inference-conflict" (an error
// when the formulas disagree). `symbols` is only read; it is non-const because look-up is.
void infer_dimensions(const syntax::parsed_file& file, std::span<const syntax::formula> formulas,
                      symbol_table& symbols, std::vector<diagnostic>& out,
                      const coherent_units* restate_in = nullptr);

// k_SI = k · f_y · Π f_i^(-e_i): the coefficient restated for coherent SI units.
//
// For an empirical formula y = k · Π x_i^e_i that holds with y and each x_i in particular
// units, f_y and f_i are the SI values of those units (0.3048 for ft, 6894.757... for psi):
// the formula written for SI values then has this coefficient.
double coherent_coefficient(double k, double f_y,
                            std::span<const std::pair<double, rational>> factors_and_exponents);

} // namespace plumb
