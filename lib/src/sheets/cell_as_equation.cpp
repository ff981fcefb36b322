#include "sheets/cell_as_equation.hpp"

#include "check/formula_checker.hpp"
#include "check/gravity_number.hpp"
#include "model/symbol_table.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <array>
#include <span>
#include <utility>

namespace plumb::sheets {

void note_reference_state(syntax::reference_value& cell, std::string_view unit_text) {
    const std::optional<reference_volume> r =
        (unit_marks_of(unit_text) & at_reference_conditions) != 0 ? reference_volume_in(unit_text)
                                                                  : std::nullopt;
    cell.reference_power = r ? static_cast<std::int8_t>(r->power) : std::int8_t{0};
    cell.reference_kelvins = r ? r->kelvins : 0.0;
    cell.reference_name = r ? r->name : std::string_view();
}

void cell_equation::make_room() {
    if (formula_ != syntax::no_index)
        return;
    tree_.references.emplace_back();
    written_reference_ = static_cast<std::uint32_t>(tree_.references.size() - 1);
    tree_.nodes.push_back({syntax::expr_kind::reference, {}, written_reference_});
    written_node_ = static_cast<std::uint32_t>(tree_.nodes.size() - 1);
    const auto first_side = static_cast<std::uint32_t>(tree_.sides.size());
    tree_.sides.push_back({written_node_, syntax::relation_kind::none});
    tree_.sides.push_back({written_node_, syntax::relation_kind::equal});
    tree_.formulas.push_back({{}, {}, first_side, 2});
    formula_ = static_cast<std::uint32_t>(tree_.formulas.size() - 1);
}

std::vector<diagnostic> cell_equation::check(std::uint32_t formula_root, span written_text,
                                             const written_unit& written, bool difference,
                                             bool enthalpy) {
    if (formula_ == syntax::no_index)
        return {}; // make_room() was not called: no equation to check
    syntax::reference_value& cell = tree_.references[written_reference_];
    cell = syntax::reference_value{};
    cell.dim = written.dim;
    cell.scale = written.scale;
    cell.exact_scale = written.exact_scale;
    cell.offset = written.offset;
    cell.difference = difference;
    cell.enthalpy = enthalpy;
    cell.unit_text = written.text;
    note_reference_state(tree_.references[written_reference_], written.text);
    tree_.nodes[written_node_].range = written_text;
    syntax::formula& equation = tree_.formulas[formula_];
    equation.range = written_text;
    tree_.sides[equation.first_side + 1].root = formula_root;
    std::vector<diagnostic> found;
    check_formula(tree_, equation, no_symbols_, found, false);
    return found;
}

namespace {

using word_pairs = std::span<const std::pair<std::string_view, std::string_view>>;

// The notation's words for an equation's sides, and a workbook's for a cell and its unit.
constexpr std::array<std::pair<std::string_view, std::string_view>, 6> side_words{{
    {"the two sides of this equation differ in dimension",
     "this formula differs in dimension from the unit written for its cell"},
    {"the sides of this equation", "the formula and the unit written for its cell"},
    {"sides of this equation", "formula and the unit written for its cell"},
    {"this equation", "this cell"},
    {"left side ", "the unit written for its cell "},
    {"right side ", "the formula "},
}};

// The notation's advice to declare symbols, and a workbook's to write units for cells.
constexpr std::array<std::pair<std::string_view, std::string_view>, 3> declaring_words{{
    {"declare the symbols in the units it converts from",
     "write for its input cells the units it converts from"},
    {"declare the symbols in coherent units", "write coherent units for its input cells"},
    {"declare it in", "write its unit as"},
}};

std::string reworded(std::string text, word_pairs words) {
    for (const auto& [notation, workbook] : words)
        for (std::size_t at = text.find(notation); at != std::string::npos;
             at = text.find(notation, at + workbook.size()))
            text.replace(at, notation.size(), workbook);
    return text;
}

bool within(span inner, span outer) {
    return inner.begin >= outer.begin && inner.end <= outer.end;
}

} // namespace

void in_workbook_words(diagnostic& d, span formula_range) {
    if (d.rule == rules::side_mismatch)
        d.rule = std::string(rules::result_unit);
    d.message = reworded(std::move(d.message), side_words);
    if (!within(d.where.range, formula_range))
        d.where.range = formula_range;
    // The written unit's text is no part of the cell's formula: no term is drawn under it.
    d.terms.erase(
        std::remove_if(d.terms.begin(), d.terms.end(),
                       [&](const term& t) { return !within(t.where.range, formula_range); }),
        d.terms.end());
    advice_in_workbook_words(d);
    for (auto& n : d.notes) {
        n.message = reworded(std::move(n.message), side_words);
        if (n.where.file != nullptr && !within(n.where.range, formula_range))
            n.where = {};
    }
}

void advice_in_workbook_words(diagnostic& d) {
    for (auto& n : d.notes) {
        // A number read as a quantity is said outright with a cell that holds it, in its unit.
        if (const std::string_view in_cell = advice_in_cell_for(n.message); !in_cell.empty())
            n.message = std::string(in_cell);
        else if (n.message.rfind("declare it with its unit (", 0) == 0)
            n.message = "write it in a cell that holds its unit, and refer to that cell, to say so";
        else
            n.message = reworded(std::move(n.message), declaring_words);
    }
}

} // namespace plumb::sheets
