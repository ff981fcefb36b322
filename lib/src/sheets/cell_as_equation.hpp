// A formula cell and the unit written for it, checked as the notation checks an equation's two
// sides: "unit = formula". One home for the rules that compare a result with its unit (a
// conversion factor not needed, a liquid column read as a gauge pressure, a conversion written
// as a sum, a trade constant), so that a formula gets the same verdict in a workbook and in a
// .plumb file.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"
#include "sheets/unit_text.hpp"

#include <vector>

namespace plumb::sheets {

class cell_equation {
  public:
    explicit cell_equation(syntax::parsed_file& tree) : tree_(tree) {}

    // Adds the equation's nodes to the tree, which may move its vectors: called once, before
    // any reference into the tree is held.
    void make_room();

    // The notation's findings on "written = the formula at formula_root". `written_text` is
    // the unit's text in the tree's source, where a finding that names that side points.
    // `difference`: the cell's row label says it holds a difference ("Range", "Friction loss").
    // `enthalpy`: its row label names an enthalpy ("Outdoor air enthalpy").
    std::vector<diagnostic> check(std::uint32_t formula_root, span written_text,
                                  const written_unit& written, bool difference = false,
                                  bool enthalpy = false);

  private:
    syntax::parsed_file& tree_;
    symbol_table no_symbols_;
    // The equation is built once and its two sides are rewritten for each cell.
    std::uint32_t formula_ = syntax::no_index;
    std::uint32_t written_node_ = syntax::no_index;
    std::uint32_t written_reference_ = syntax::no_index;
};

// A notation finding on a cell's equation in a workbook's words: the side that is the written
// unit becomes "the unit written for its cell", and advice to declare symbols becomes advice
// to write units for cells. Findings that point at the written unit's text are moved to the
// formula at `formula_range`.
void in_workbook_words(diagnostic& d, span formula_range);

// Marks a cell that holds a gas volume at reference conditions (its unit text names Nm³, Sm³
// or scf) with that reference state, for the rules that compare two such volumes.
void note_reference_state(syntax::reference_value& cell, std::string_view unit_text);

// The advice in a finding's notes to declare a number as a symbol with its unit, said for a
// workbook: write it in a cell that holds its unit.
void advice_in_workbook_words(diagnostic& d);

} // namespace plumb::sheets
