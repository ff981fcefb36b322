#include "check/constant_in_other_units.hpp"

#include <cmath>
#include <fmt/format.h>

namespace plumb {

std::optional<constant_in_other_units> read_constant_in_other_units(
    double term_scale, double reference_scale, std::span<const scale_literal> numbers,
    std::span<const std::string_view> texts, const dimension& lacking,
    carried_quantity::term_kind kind, std::span<const declared_factor> factors) {
    bool any_fits = false;
    for (const scale_literal& number : numbers)
        any_fits = any_fits || lacks_gravity_number(lacking, number.exponent);
    if (!any_fits)
        return std::nullopt;
    std::optional<constant_in_other_units> found;
    double best_off_middle = 0.0;
    bool ambiguous = false;
    for (std::size_t f = 0; f < factors.size(); ++f) {
        const declared_factor& factor = factors[f];
        if (!(factor.si_scale > 0))
            continue;
        const counterparts_of_unit units = unit_counterparts(factor.dim, factor.si_scale);
        for (const unit_counterpart& other : units.others) {
            const double scale =
                term_scale * std::pow(other.si_scale / factor.si_scale, factor.exponent);
            const auto reading =
                read_gravity_number(scale, reference_scale, numbers, texts, lacking, false, kind);
            // A reading a power of ten away, or of a number that is itself a unit conversion
            // (100, 3.281), is too easily a coincidence to be advice.
            if (!reading || reading->shifted ||
                looks_like_conversion(numbers[reading->literal], true))
                continue;
            const scale_literal& number = numbers[reading->literal];
            const double off_middle =
                std::abs(std::log(number.value / std::sqrt(reading->least * reading->greatest)));
            if (found && std::abs(off_middle - best_off_middle) < 0.01) {
                ambiguous = true;
                continue;
            }
            if (found && off_middle > best_off_middle)
                continue;
            ambiguous = false;
            best_off_middle = off_middle;
            // The number fits the term's scale changed by (other/declared)^exponent; in the
            // declared unit it is that change to the power 1/(its own exponent) the other way.
            const double in_declared = number.value * std::pow(factor.si_scale / other.si_scale,
                                                               factor.exponent / number.exponent);
            found = constant_in_other_units{
                f, factor.unit_text.empty() ? units.declared : factor.unit_text, &other, *reading,
                in_declared};
        }
    }
    if (ambiguous)
        return std::nullopt;
    return found;
}

std::string constant_in_other_units_message(std::string_view number, std::string_view factor,
                                            const constant_in_other_units& found) {
    return fmt::format("{} is {}{} for {} in {}, but {} is in {}: in {} the number comes to "
                       "about {:.4g}, or convert {} to {} first",
                       number, found.reading.reciprocal ? "one over " : "",
                       found.reading.quantity->what, factor, found.other->name, factor,
                       found.declared, found.declared, found.in_declared, factor,
                       found.other->name);
}

} // namespace plumb
