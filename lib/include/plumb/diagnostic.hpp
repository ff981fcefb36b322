// One diagnostic model shared by every check and every renderer.
#pragma once

#include "plumb/dimension.hpp"
#include "plumb/source.hpp"

#include <optional>
#include <string>
#include <vector>

namespace plumb {

enum class severity { note, warning, error };

// A place in a file, or no place (a finding about a whole run, such as an unreadable path).
struct location {
    const source_file* file = nullptr;
    span range{};
};

// A term that takes part in a disagreement, with its dimension: the text excerpt draws a brace
// under it and a ledger row for it, and JSON lists them.
struct term {
    location where;
    std::string text; // the term as written (continuation lines folded)
    dimension dim;
    bool differs = false; // the odd one out: its dimension does not match the others'
    // In a workbook, the cell or range the term names, when it names one.
    std::string sheet = {};
    std::string cell = {}; // A1 form, "C4" or "C4:C9"
};

// A secondary remark, optionally at a place of its own ("first declared here").
struct note {
    std::string message;
    location where;
    // Only repeats the terms' dimensions, which the text excerpt's ledger already shows; text
    // leaves it out, JSON keeps it.
    bool restates_terms = false;
};

// Why a reviewed finding is accepted: an inline mark on its line or an entry of the project's
// file of accepted findings. An accepted finding is still reported, with its reason; it only
// stops failing the run.
struct acceptance {
    std::string reason;
    location mark; // the inline mark, or the entry in the file of accepted findings
    bool by_inline_mark = true;
};

// A unit-bound coefficient ("1.486?") restated for a consistent set of units: JSON lists them.
struct restated_coefficient {
    std::string units;         // "SI", or the base units of another set ("ft, lbf, s")
    double value = 0.0;        // the coefficient for that set, to full double precision
    std::string factor;        // value = written × factor; the factor in units, exact as
                               // written ("(ft/s)/ft^(2/3)")
    std::string factor_digits; // the same with the units' SI values ("0.3048^(1/3)")
    double factor_value = 1.0;
    std::vector<std::string> holds_with; // the units the written coefficient needs: "V in ft/s"
};

struct diagnostic {
    severity level = severity::error;
    std::string rule;    // stable rule id, see rules.hpp
    std::string message; // lower case, no trailing period
    location where;      // primary range: marked in the excerpt
    // A few words for the primary range's ledger row when no term covers it ("not declared").
    std::string mark_label;
    std::vector<term> terms;
    std::vector<note> notes;
    std::optional<acceptance> accepted;
    std::vector<restated_coefficient> restated; // inferred-dimension notes of a coefficient
};

} // namespace plumb
