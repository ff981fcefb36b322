// Text to syntax tree: splits a file into logical lines and parses each with the grammar.
#pragma once

#include "model/syntax_tree.hpp"

namespace plumb {

// Told of each statement as soon as its line is parsed, so that formulas can be checked
// while their tree is still in cache and then dropped: a large file never needs all of its
// trees in memory at once.
class statement_sink {
  public:
    virtual ~statement_sink() = default;
    virtual void on_use(const syntax::parsed_file& file, const syntax::use_line& use) = 0;
    virtual void on_declaration(const syntax::parsed_file& file, std::uint32_t declaration) = 0;
    // True when the formula is dealt with and its tree may be dropped.
    virtual bool on_formula(const syntax::parsed_file& file, const syntax::formula& formula) = 0;
    // A unit defined in a file this one uses, by name; null when there is none.
    [[nodiscard]] virtual const syntax::defined_unit* imported_unit(std::string_view name) const {
        (void)name;
        return nullptr;
    }
};

// Never throws on any input: syntax errors, unknown units and exponent overflow become
// diagnostics in the result, and parsing goes on with the next line. Without a sink, every
// statement stays in the result.
syntax::parsed_file parse_file(const source_file& file, statement_sink* sink = nullptr);

// The whole text as one expression (its tree's single formula has one side).
syntax::parsed_file parse_expression(const source_file& file);

} // namespace plumb
