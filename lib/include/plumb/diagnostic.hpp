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

// A term that takes part in a disagreement, with its dimension: renderers print one note for
// each, and JSON lists them.
struct term {
    location where;
    std::string text; // the term as written (continuation lines folded)
    dimension dim;
    // In a workbook, the cell or range the term names, when it names one.
    std::string sheet = {};
    std::string cell = {}; // A1 form, "C4" or "C4:C9"
};

// A secondary remark, optionally at a place of its own ("first declared here").
struct note {
    std::string message;
    location where;
};

struct diagnostic {
    severity level = severity::error;
    std::string rule;    // stable rule id, see rules.hpp
    std::string message; // lower case, no trailing period
    location where;      // primary range: underlined with ^~~~
    std::vector<term> terms;
    std::vector<note> notes;
};

} // namespace plumb
