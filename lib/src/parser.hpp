// Text to syntax tree: splits a file into logical lines and parses each with the grammar.
#pragma once

#include "syntax_tree.hpp"

namespace plumb {

// Never throws on any input: syntax errors, unknown units and exponent overflow become
// diagnostics in the result, and parsing goes on with the next line.
syntax::parsed_file parse_file(const source_file& file);

// The whole text as one expression (its tree's single formula has one side).
syntax::parsed_file parse_expression(const source_file& file);

} // namespace plumb
