// Units for cells (sidecar, defined names, the cell beside, the column's heading), the
// dependency order of formula cells, and the checks only a workbook has: the unit written
// beside a formula against what it computes, ranges of one dimension, inputs without units.
#include "sheets/workbook_checker.hpp"

#include "model/ascii_case.hpp"
#include "model/difference_name.hpp"
#include "model/subtree_search.hpp"

#include "check/constant_in_other_units.hpp"
#include "check/formula_checker.hpp"
#include "check/gravity_number.hpp"
#include "check/number_reading.hpp"
#include "check/reference_state.hpp"
#include "check/scale_match.hpp"
#include "check/trade_constants.hpp"
#include "plumb/rules.hpp"
#include "sheets/a1_front_end.hpp"
#include "sheets/cell_as_equation.hpp"
#include "sheets/input_requirement.hpp"
#include "units/exact_factor.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>
#include <fmt/format.h>
#include <map>
#include <set>
#include <tuple>

namespace plumb::sheets {

namespace {

std::string describe(const dimension& d) {
    if (d.is_dimensionless())
        return "[1] (dimensionless)";
    const std::string_view name = quantity_name(d);
    return name.empty() ? d.to_string() : fmt::format("{} ({})", d.to_string(), name);
}

// "a length [L]", "a dimensionless number [1]": what a value must be, in words.
std::string kind_of(const dimension& d) {
    if (d.is_dimensionless())
        return "a dimensionless number [1]";
    const std::string_view name = quantity_name(d);
    if (name.empty())
        return d.to_string();
    const bool vowel = std::string_view("aeiou").find(name.front()) != std::string_view::npos;
    return fmt::format("{} {} {}", vowel ? "an" : "a", name, d.to_string());
}

// A cell's unit and where it came from, or none.
struct cell_unit {
    written_unit unit;
    std::string origin; // "beside it in D44", "from the heading in C12", ...
};

// What a cell holds for the formulas that use it.
struct cell_value {
    std::optional<dimension> dim; // empty: unknown, not checked
    double scale = 1.0;
    std::optional<rational> exact_scale; // the same exactly, where its unit is exact
    const unit_definition* offset = nullptr;
    std::optional<rational> value;
    const cell_unit* unit = nullptr; // the unit written for it; null when computed

    [[nodiscard]] std::string describe_for(const std::string& name) const {
        if (unit == nullptr)
            return fmt::format("{} is {}, computed by its formula", name, describe(*dim));
        return fmt::format("{} is in {}, unit {}", name, unit->unit.text, unit->origin);
    }
};

constexpr std::uint64_t book_key(std::size_t sheet, cell_address a) {
    return (static_cast<std::uint64_t>(sheet) << 45) | sheet::key(a);
}

class workbook_checker {
  public:
    workbook_checker(const workbook& book, const std::string& path, const outside_units& units,
                     check_report& report, bool record_cells)
        : book_(book), path_(path), units_(units), report_(report), record_cells_(record_cells) {}

    void run() {
        collect_formulas();
        build_listing();
        lower_all();
        find_site_barometer();
        equation_.make_room();
        order_and_check();
        const std::size_t first_finding = report_.diagnostics.size();
        report_unitless_inputs();
        if (record_cells_)
            record_checked_cells(first_finding);
        ++report_.workbooks_checked;
        report_.files_checked += 1;
    }

  private:
    // Each formula cell checked, as the notation's formulas are recorded: its place and the
    // most severe finding in it, so that the JSON lists the cells that passed too.
    void record_checked_cells(std::size_t first_finding) {
        std::vector<std::pair<std::uint32_t, severity>> starts;
        for (std::size_t i = first_finding; i < report_.diagnostics.size(); ++i) {
            const diagnostic& d = report_.diagnostics[i];
            if (d.where.file == listing_)
                starts.emplace_back(d.where.range.begin, d.level);
        }
        std::sort(starts.begin(), starts.end());
        std::sort(checked_cells_.begin(), checked_cells_.end(),
                  [&](std::uint32_t a, std::uint32_t b) {
                      return formulas_[a].text.begin < formulas_[b].text.begin;
                  });
        for (const std::uint32_t id : checked_cells_) {
            formula_record r;
            r.where = {listing_, formulas_[id].text};
            r.written_unit = std::string(listing_->text(formulas_[id].written_text));
            auto it = std::lower_bound(starts.begin(), starts.end(),
                                       std::pair{r.where.range.begin, severity::note});
            for (; it != starts.end() && it->first <= r.where.range.end; ++it)
                if (!r.worst || *r.worst < it->second)
                    r.worst = it->second;
            report_.formulas.push_back(std::move(r));
        }
    }

    const workbook& book_;
    const std::string& path_;
    const outside_units& units_;
    check_report& report_;
    bool record_cells_ = false;
    std::vector<std::uint32_t> checked_cells_; // formula ids, with record_cells_

    struct formula_cell {
        std::size_t sheet;
        const cell* source;
        span text;
        span written_text; // the unit written for it, in the listing; empty when none
        lowered_formula lowered;
        std::vector<std::uint32_t> depends_on; // formula ids
        bool checked = false;
        bool in_cycle = false;
        cell_value result;
    };
    std::vector<formula_cell> formulas_;
    std::unordered_map<std::uint64_t, std::uint32_t> formula_at_;
    lowered_book lowered_;
    cell_equation equation_{lowered_.tree};
    const source_file* listing_ = nullptr;
    span hundred_{};
    symbol_table no_symbols_;
    std::vector<diagnostic> out_;
    std::unordered_map<std::uint64_t, std::optional<cell_unit>> unit_cache_;
    // Per sheet and column: the rows of text cells, in order, for headings.
    std::vector<std::unordered_map<std::uint32_t, std::vector<std::uint32_t>>> text_rows_;
    // Inputs without units: the formula cells that use each, in order.
    std::map<std::uint64_t, std::vector<std::uint32_t>> unitless_;
    // Cells whose unit text beside them or in their column's heading does not read as a unit:
    // that text and where it is written, by cell.
    struct unread_unit {
        const cell* written_in;
        std::string text;
        bool heading;
    };
    std::unordered_map<std::uint64_t, unread_unit> unread_;
    struct range_result {
        cell_value value;
    };
    std::map<std::tuple<std::size_t, std::uint64_t, std::uint64_t>, cell_value> range_cache_;
    std::uint32_t current_ = 0; // the formula being checked
    std::set<std::pair<const void*, const void*>> reported_conflicts_;

    void collect_formulas() {
        text_rows_.resize(book_.sheets.size());
        std::size_t cells = 0;
        for (const auto& sh : book_.sheets)
            cells += sh.cells.size();
        formula_at_.reserve(cells);
        formulas_.reserve(cells);
        unit_cache_.reserve(cells);
        for (std::size_t s = 0; s < book_.sheets.size(); ++s)
            for (const auto& c : book_.sheets[s].cells) {
                if (c.kind == cell_kind::formula) {
                    formula_at_[book_key(s, c.at)] = static_cast<std::uint32_t>(formulas_.size());
                    formulas_.push_back({s, &c, {}, {}, {}, {}, false, false, {}});
                } else if (c.kind == cell_kind::text) {
                    text_rows_[s][c.at.column].push_back(c.at.row);
                }
            }
        for (auto& sheet_rows : text_rows_)
            for (auto& [column, rows] : sheet_rows)
                std::sort(rows.begin(), rows.end());
    }

    void build_listing() {
        std::string text;
        std::vector<cell_place> places;
        for (auto& f : formulas_) {
            std::string_view shown = f.source->text;
            if (!shown.empty() && shown.front() == '\x01')
                shown.remove_prefix(1);
            if (shown.empty())
                shown = "=";
            const auto begin = static_cast<std::uint32_t>(text.size());
            for (const char c : shown)
                text += (c == '\n' || c == '\r') ? ' ' : c;
            f.text = {begin, static_cast<std::uint32_t>(text.size())};
            text += '\n';
            places.push_back({book_.sheets[f.sheet].name, a1_name(f.source->at)});
        }
        hundred_ = {static_cast<std::uint32_t>(text.size()),
                    static_cast<std::uint32_t>(text.size() + 3)};
        text += "100\n";
        // The units written for formula cells, for the equation each cell is checked as.
        for (auto& f : formulas_)
            if (const cell_unit* u = unit_of(f.sheet, f.source->at)) {
                const auto begin = static_cast<std::uint32_t>(text.size());
                for (const char c : u->unit.text)
                    text += (c == '\n' || c == '\r') ? ' ' : c;
                f.written_text = {begin, static_cast<std::uint32_t>(text.size())};
                text += '\n';
            }
        report_.sources.push_back(std::make_unique<source_file>(path_, std::move(text)));
        report_.sources.back()->set_cell_places(std::move(places));
        listing_ = report_.sources.back().get();
        lowered_.tree.source = listing_;
        lowered_.tree.functions = syntax::function_names::spreadsheet;
    }

    diagnostic& report(severity level, std::string_view rule, std::string message, span where) {
        diagnostic d;
        d.level = level;
        d.rule = std::string(rule);
        d.message = std::move(message);
        d.where = {listing_, where};
        out_.push_back(std::move(d));
        return out_.back();
    }

    void lower_all() {
        for (auto& f : formulas_) {
            const std::string_view raw = f.source->text;
            if (raw.empty()) {
                report(severity::warning, rules::not_checked,
                       "this cell follows a shared formula whose references plumb cannot move "
                       "here (a whole row or column, a cell off the sheet, or no master), so it "
                       "is not checked",
                       f.text);
                continue;
            }
            if (raw.front() == '\x01') {
                report(severity::warning, rules::not_checked,
                       "this formula is not OpenFormula that plumb can read, so it is not checked",
                       f.text);
                continue;
            }
            f.lowered = lower_formula(lowered_, book_, f.sheet, f.text.begin, f.text.end, hundred_);
            if (!f.lowered.syntax_error.empty()) {
                diagnostic& d = report(severity::warning, rules::not_checked,
                                       fmt::format("this formula cannot be read ({}), so it is not "
                                                   "checked",
                                                   f.lowered.syntax_error),
                                       f.lowered.syntax_at);
                d.notes.push_back({"plumb reads the formula as the spreadsheet stores it "
                                   "(ECMA-376 or OpenFormula syntax)",
                                   {}});
                continue;
            }
            for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
                const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
                for_each_cell(r.sheet, r.area, [&](const cell& c) {
                    if (c.kind != cell_kind::formula)
                        return;
                    f.depends_on.push_back(formula_at_.at(book_key(r.sheet, c.at)));
                });
            }
        }
    }

    template <typename F> void for_each_cell(std::size_t s, const cell_area& area, F&& f) const {
        const sheet& sh = book_.sheets[s];
        const std::uint64_t cells = static_cast<std::uint64_t>(area.last.row - area.first.row + 1) *
                                    (area.last.column - area.first.column + 1);
        if (cells <= sh.cells.size()) {
            for (std::uint32_t r = area.first.row; r <= area.last.row; ++r)
                for (std::uint32_t c = area.first.column; c <= area.last.column; ++c)
                    if (const cell* found = sh.find({r, c}))
                        f(*found);
        } else {
            for (const auto& c : sh.cells)
                if (area.contains(c.at))
                    f(c);
        }
    }

    // Depth-first, without recursion: a column of 100 000 chained cells must not overflow.
    void order_and_check() {
        enum class mark : std::uint8_t { unseen, open, done };
        std::vector<mark> marks(formulas_.size(), mark::unseen);
        std::vector<std::pair<std::uint32_t, std::size_t>> stack;
        for (std::uint32_t start = 0; start < formulas_.size(); ++start) {
            if (marks[start] != mark::unseen)
                continue;
            stack.push_back({start, 0});
            marks[start] = mark::open;
            while (!stack.empty()) {
                auto& [id, next] = stack.back();
                if (next < formulas_[id].depends_on.size()) {
                    const std::uint32_t dep = formulas_[id].depends_on[next++];
                    if (marks[dep] == mark::unseen) {
                        marks[dep] = mark::open;
                        stack.push_back({dep, 0});
                    } else if (marks[dep] == mark::open) {
                        report_cycle(stack, dep);
                    }
                    continue;
                }
                marks[id] = mark::done;
                const std::uint32_t finished = id;
                stack.pop_back();
                check_cell(finished);
            }
        }
    }

    void report_cycle(const std::vector<std::pair<std::uint32_t, std::size_t>>& stack,
                      std::uint32_t back_to) {
        std::vector<std::uint32_t> cycle;
        for (auto it = stack.rbegin(); it != stack.rend(); ++it) {
            cycle.push_back(it->first);
            if (it->first == back_to)
                break;
        }
        if (std::any_of(cycle.begin(), cycle.end(),
                        [&](std::uint32_t id) { return formulas_[id].in_cycle; }))
            return; // one report per cycle
        std::reverse(cycle.begin(), cycle.end());
        std::vector<std::string> names;
        for (const std::uint32_t id : cycle) {
            formulas_[id].in_cycle = true;
            names.push_back(cell_name(id));
        }
        names.push_back(cell_name(cycle.front()));
        diagnostic& d = report(
            severity::error, rules::circular_reference,
            fmt::format("this formula depends on itself through {}", fmt::join(names, " -> ")),
            formulas_[cycle.front()].text);
        d.notes.push_back({"a circular reference has no value to check; the cells in it are not "
                           "checked",
                           {}});
    }

    std::string cell_name(std::uint32_t id) const {
        const auto& f = formulas_[id];
        return cell_text({book_.sheets[f.sheet].name, a1_name(f.source->at)});
    }

    // ---- Units of cells -------------------------------------------------------------------

    // Cached: a unit is read once per cell however many formulas use it. The map's nodes
    // never move, so the pointer stays valid.
    const cell_unit* unit_of(std::size_t s, cell_address a) {
        const std::uint64_t key = book_key(s, a);
        auto it = unit_cache_.find(key);
        if (it == unit_cache_.end())
            it = unit_cache_.emplace(key, discover_unit(s, a)).first;
        return it->second ? &*it->second : nullptr;
    }

    std::optional<cell_unit> discover_unit(std::size_t s, cell_address a) {
        const sheet& sh = book_.sheets[s];
        // 1. The sidecar beside the workbook, then those given with --dict.
        const outside_units::area_unit* chosen = nullptr;
        for (const auto& au : units_.areas) {
            if ((!au.sheet.empty() && au.sheet != sh.name) || !au.area.contains(a))
                continue;
            if (chosen == nullptr)
                chosen = &au;
            else if (au.unit.origin != chosen->unit.origin && differ(au.unit, chosen->unit))
                report_sidecar_conflict(*chosen, au, s, a);
        }
        if (chosen != nullptr)
            return cell_unit{chosen->unit.unit, fmt::format("from {}", chosen->unit.origin)};
        // 2. A defined name a dictionary declares.
        if (!units_.names.empty())
            for (const auto& n : book_.names) {
                const std::string upper_name = upper_ascii(n.name);
                const auto it = units_.names.find(upper_name);
                if (it == units_.names.end())
                    continue;
                const auto r = resolve_reference(book_, s, n.refers_to);
                if (r && r->first == s && r->second.contains(a))
                    return cell_unit{it->second.unit, fmt::format("from the name {} in {}", n.name,
                                                                  it->second.origin)};
            }
        // 3. The cell beside it.
        if (a.column + 1 < max_columns)
            if (const cell* right = sh.find({a.row, a.column + 1});
                right != nullptr && right->kind == cell_kind::text) {
                if (auto u = read_unit_text(right->text, units_.measures)) {
                    boiler_horsepower_by_label(s, a, right->text, *u);
                    return cell_unit{*u, fmt::format("beside it in {}",
                                                     a1_name(cell_address{a.row, a.column + 1}))};
                }
                unread_.emplace(book_key(s, a), unread_unit{right, right->text, false});
            }
        // 4. The column's heading: the nearest text cell above.
        const auto column = text_rows_[s].find(a.column);
        if (column != text_rows_[s].end()) {
            const auto& rows = column->second;
            const auto it = std::lower_bound(rows.begin(), rows.end(), a.row);
            if (it != rows.begin()) {
                const cell_address heading{*(it - 1), a.column};
                const cell* above = sh.find(heading);
                if (auto u = read_heading_unit(above->text, units_.measures)) {
                    boiler_horsepower_by_label(s, a, u->text, *u);
                    return cell_unit{*u, fmt::format("from the heading in {}", a1_name(heading))};
                }
                // "Target [fc]": a unit written in the heading that plumb cannot read leaves the
                // column unchecked, which must be said as for the text beside a cell.
                if (auto written = heading_unit_text(above->text))
                    unread_.emplace(book_key(s, a), unread_unit{above, std::move(*written), true});
            }
        }
        return std::nullopt;
    }

    // "Boiler output | =C26/33475 | BHP": boiler makers write BHP for the boiler horsepower,
    // 33 475 Btu/h (ABMA; common practice), which the unit table keeps as BoHP; a shaft's
    // brake horsepower is the hp. Read so where the row's label names a boiler.
    void boiler_horsepower_by_label(std::size_t s, cell_address a, std::string_view text,
                                    written_unit& u) const {
        if (text != "BHP" && text != "bhp")
            return;
        const std::string label = lower_ascii(label_of(s, a).description);
        if (label.find("boiler") == std::string::npos)
            return;
        if (auto boiler = read_unit_text("BoHP", units_.measures)) {
            boiler->text = std::string(text);
            u = std::move(*boiler);
        }
    }

    static bool differ(const declared_unit& a, const declared_unit& b) {
        return !(a.unit.dim == b.unit.dim) || a.unit.offset != b.unit.offset ||
               std::abs(a.unit.scale / b.unit.scale - 1.0) > 1e-12;
    }

    // Two cells lines from different files give one cell different units: reported once per
    // pair of lines, at the line whose unit is used.
    void report_sidecar_conflict(const outside_units::area_unit& used,
                                 const outside_units::area_unit& other, std::size_t s,
                                 cell_address a) {
        if (!reported_conflicts_.insert({&used, &other}).second)
            return;
        const std::string cell = cell_text({book_.sheets[s].name, a1_name(a)});
        diagnostic d;
        d.level = severity::error;
        d.rule = std::string(rules::sidecar_problem);
        d.message = fmt::format("{} gives {} the unit '{}', but {} gives it '{}'", used.unit.origin,
                                cell, used.unit.unit.text, other.unit.origin, other.unit.unit.text);
        d.where = used.where;
        if (other.where.file != nullptr)
            d.notes.push_back(
                {fmt::format("{} says '{}' here", other.unit.origin, other.unit.unit.text),
                 other.where});
        d.notes.push_back({fmt::format("the cells are checked with '{}' from {}, which comes first "
                                       "(the sidecar beside the workbook, then --dict files in "
                                       "order); give each cell one unit",
                                       used.unit.unit.text, used.unit.origin),
                           {}});
        out_.push_back(std::move(d));
    }

    static cell_value from_unit(const cell_unit& u) {
        cell_value v;
        v.dim = u.unit.dim;
        v.scale = u.unit.scale;
        v.exact_scale = u.unit.exact_scale;
        v.offset = u.unit.offset;
        v.unit = &u;
        return v;
    }

    cell_value value_of(std::size_t s, const cell& c) {
        if (c.kind == cell_kind::formula) {
            const auto it = formula_at_.find(book_key(s, c.at));
            return formulas_[it->second].result;
        }
        if (c.kind == cell_kind::boolean) {
            cell_value v;
            v.dim = dimension{};
            return v;
        }
        if (c.kind != cell_kind::number)
            return {};
        const cell_unit* u = unit_of(s, c.at);
        if (u == nullptr) {
            auto& users = unitless_[book_key(s, c.at)];
            if (users.empty() || users.back() != current_)
                users.push_back(current_);
            return {};
        }
        cell_value v = from_unit(*u);
        if (v.dim && v.dim->is_dimensionless() && v.scale == 1.0)
            v.value = rational::parse(c.text);
        return v;
    }

    cell_value value_of_range(const lowered_reference& r, bool& reported) {
        const auto key = std::tuple{r.sheet, sheet::key(r.area.first), sheet::key(r.area.last)};
        if (const auto it = range_cache_.find(key); it != range_cache_.end()) {
            // Cells without units are reported with each formula that uses them.
            for_each_cell(r.sheet, r.area, [&](const cell& c) {
                if (c.kind == cell_kind::number && !unit_of(r.sheet, c.at))
                    (void)value_of(r.sheet, c);
            });
            return it->second;
        }
        struct member {
            const cell* c;
            cell_value v;
        };
        std::vector<member> members;
        for_each_cell(r.sheet, r.area, [&](const cell& c) {
            cell_value v = value_of(r.sheet, c);
            if (v.dim)
                members.push_back({&c, std::move(v)});
        });
        cell_value result;
        if (!members.empty()) {
            const member* odd = nullptr;
            for (const auto& m : members)
                if (!(*m.v.dim == *members.front().v.dim) ||
                    std::abs(m.v.scale / members.front().v.scale - 1.0) > 1e-9 ||
                    m.v.offset != members.front().v.offset) {
                    odd = &m;
                    break;
                }
            if (odd == nullptr) {
                result = members.front().v;
                result.value.reset();
            } else {
                const member& first = members.front();
                const bool same_dim = *odd->v.dim == *first.v.dim;
                diagnostic& d = report(
                    severity::error, rules::mixed_range,
                    fmt::format("the range {} holds values of different {}: {} and {} cannot be "
                                "summed, averaged or compared as one",
                                a1_name(r.area), same_dim ? "units" : "dimensions",
                                a1_name(first.c->at), a1_name(odd->c->at)),
                    r.where);
                for (const member* m : {&first, odd}) {
                    d.notes.push_back({m->v.describe_for(a1_name(m->c->at)), {}});
                }
                reported = true;
            }
        }
        range_cache_.emplace(key, result);
        return result;
    }

    static bool looks_up(std::string_view formula) {
        for (const std::string_view name : {"LOOKUP(", "INDEX(", "MATCH(", "CHOOSE("})
            if (formula.find(name) != std::string_view::npos)
                return true;
        return false;
    }

    // "Friction loss | dp_f | 12 | psi": the text cells before a value on its row, read as the
    // notation reads a symbol's name and description. The name is a text without blanks.
    // The text to the left of a cell on its row: its label, and a short one without spaces
    // taken for its symbol ("SG", "ΔT").
    struct row_label {
        std::string description;
        std::string_view name;
    };
    row_label label_of(std::size_t s, cell_address a) const {
        constexpr std::uint32_t most_columns = 6;
        row_label label;
        for (std::uint32_t column = a.column > most_columns ? a.column - most_columns : 0;
             column < a.column; ++column) {
            const cell* c = book_.sheets[s].find({a.row, column});
            if (c == nullptr || c->kind != cell_kind::text || c->text.size() > 80)
                continue;
            if (c->text.find(' ') == std::string::npos && c->text.size() <= 12)
                label.name = c->text;
            label.description += c->text;
            label.description += ' ';
        }
        return label;
    }

    // "Operating vacuum | 19 | inHg": a reading counted down from the atmosphere.
    bool labelled_a_vacuum(std::size_t s, cell_address a) const {
        const std::string words = lower_ascii(label_of(s, a).description);
        return words.find("vacuum") != std::string::npos;
    }

    // "SMYS of the line pipe", "Yield strength", "Young's modulus": a material's stress.
    bool labelled_a_stress(std::size_t s, cell_address a) const {
        const row_label label = label_of(s, a);
        return !label.description.empty() &&
               (names_a_stress(label.name, label.description) ||
                label.description.find("SMYS") != std::string::npos ||
                lower_ascii(label.description).find("yield") != std::string::npos);
    }

    bool labelled_a_specific_gravity(std::size_t s, cell_address a) const {
        const row_label label = label_of(s, a);
        return !label.description.empty() && names_specific_gravity(label.name, label.description);
    }

    // The column's heading, the nearest text above a cell, without its unit: "ΔT [°F]" gives
    // "ΔT", as name (one short word) and words.
    row_label heading_of(std::size_t s, cell_address a) const {
        row_label heading;
        const auto column = text_rows_[s].find(a.column);
        if (column == text_rows_[s].end())
            return heading;
        const auto it = std::lower_bound(column->second.begin(), column->second.end(), a.row);
        if (it == column->second.begin())
            return heading;
        const cell* above = book_.sheets[s].find({*(it - 1), a.column});
        if (above == nullptr || above->kind != cell_kind::text || above->text.size() > 80)
            return heading;
        std::string_view words = above->text;
        words = words.substr(0, std::min(words.find('['), words.find('(')));
        while (!words.empty() && words.back() == ' ')
            words.remove_suffix(1);
        if (words.find(' ') == std::string_view::npos && words.size() <= 12)
            heading.name = words;
        heading.description = std::string(words);
        return heading;
    }

    // "Outdoor air enthalpy", "h_sa [kJ/kg]" with a heading "Enthalpy": the row label or the
    // column's heading names an enthalpy.
    bool labelled_an_enthalpy(std::size_t s, cell_address a) const {
        const auto names = [](const std::string& words) {
            return words.find("enthalpy") != std::string::npos ||
                   words.find("Enthalpy") != std::string::npos;
        };
        return names(label_of(s, a).description) || names(heading_of(s, a).description);
    }

    // "=C50-C54": an absolute pressure's cell less a gauge pressure's.
    bool absolute_less_gauge(std::uint32_t root) const {
        const syntax::expr_node& n =
            lowered_.tree.nodes[syntax::inside_brackets(lowered_.tree, root)];
        if (n.kind != syntax::expr_kind::subtract)
            return false;
        const auto cell = [&](std::uint32_t k) -> const syntax::reference_value* {
            const syntax::expr_node& c = lowered_.tree.nodes[k];
            return c.kind == syntax::expr_kind::reference ? &lowered_.tree.references[c.lhs]
                                                          : nullptr;
        };
        const syntax::reference_value* a = cell(n.lhs);
        const syntax::reference_value* b = cell(n.rhs);
        return a != nullptr && b != nullptr && b->offset != nullptr &&
               b->offset->scale == unit_scale::gauge && a->offset == nullptr && !a->difference &&
               a->dim && *a->dim == b->offset->dim();
    }

    // "Hydrostatic pressure at TVD | =0.052*C6*C7 | psig": a column's pressure written in a
    // gauge unit is the gauge reading at its foot, as the notation reads psig (common
    // practice); in an absolute unit it is the column's difference, ρ·g·h. `gauge` says which.
    bool labelled_a_difference(std::size_t s, cell_address a, bool gauge = false) const {
        const auto says = [&](const row_label& l) {
            if (l.description.empty())
                return false;
            if (!gauge)
                return names_a_difference(l.name, l.description);
            std::string words = lower_ascii(l.description);
            for (std::size_t at = words.find("hydrostatic"); at != std::string::npos;
                 at = words.find("hydrostatic", at))
                words.replace(at, 11, "column");
            return names_a_difference(l.name, words);
        };
        if (says(label_of(s, a)))
            return true;
        // "ΔT [°F]", "Rise [K]": the column's heading names it one.
        return says(heading_of(s, a));
    }

    // A length whose row label, or else its column's heading, names a diameter or a radius.
    round_length labelled_round(std::size_t s, cell_address a) const {
        // By the label's words only: a row named "Drive" or "Rope" is no diameter or radius.
        const row_label label = label_of(s, a);
        if (const round_length r = names_a_diameter_or_radius({}, label.description);
            r != round_length::none)
            return r;
        const row_label heading = heading_of(s, a);
        return names_a_diameter_or_radius(heading.name, heading.description);
    }

    // "Site barometric pressure | 13.46 | psia": the first number cell of an absolute
    // pressure whose row label names the atmosphere, and not a standard, a vacuum or a gauge.
    // The rules that hold a typed atmosphere to the site's read it as a declared barometer.
    void find_site_barometer() {
        const dimension pressure = dimension::base(base_dimension::mass) /
                                   dimension::base(base_dimension::length) /
                                   dimension::base(base_dimension::time).pow(rational(2));
        for (std::size_t s = 0; s < book_.sheets.size(); ++s)
            for (const auto& c : book_.sheets[s].cells) {
                if (c.kind != cell_kind::number)
                    continue;
                const cell_unit* u = unit_of(s, c.at);
                if (u == nullptr || u->unit.offset != nullptr || !(u->unit.dim == pressure))
                    continue;
                const row_label label = label_of(s, c.at);
                if (label.description.empty() ||
                    !names_a_site_barometer(label.name, label.description))
                    continue;
                const double value = std::strtod(c.text.c_str(), nullptr);
                if (!(value > 0) || !std::isfinite(value))
                    continue;
                lowered_.tree.barometer = syntax::parsed_file::sheet_barometer{
                    book_.sheets.size() == 1 ? a1_name(c.at)
                                             : book_.sheets[s].name + "!" + a1_name(c.at),
                    value * u->unit.scale, u->unit.scale};
                return;
            }
    }

    // ---- Checking one formula cell --------------------------------------------------------

    void check_cell(std::uint32_t id) {
        current_ = id;
        formula_cell& f = formulas_[id];
        const cell_unit* written = unit_of(f.sheet, f.source->at);
        if (written != nullptr)
            f.result = from_unit(*written); // downstream cells take the written unit
        if (f.lowered.formula == syntax::no_index || f.in_cycle) {
            ++report_.cells_not_checked;
            return;
        }
        bool range_reported = false;
        for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
            const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
            cell_value v;
            if (r.area.single()) {
                if (const cell* c = book_.sheets[r.sheet].find(r.area.first))
                    v = value_of(r.sheet, *c);
            } else if (f.lowered.not_checked.empty() || !looks_up(f.source->text)) {
                v = value_of_range(r, range_reported);
            }
            // A lookup's table in a cell not checked (its column computed) is no range of one
            // unit: a lookup table's key and value columns differ by design.
            syntax::reference_value& target = lowered_.tree.references[r.reference];
            target.dim = v.dim;
            target.scale = v.scale;
            target.exact_scale = v.exact_scale;
            target.offset = v.offset;
            target.value = v.value;
            target.difference =
                r.area.single() && v.dim &&
                labelled_a_difference(r.sheet, r.area.first,
                                      v.offset != nullptr && v.offset->scale == unit_scale::gauge);
            target.specific_gravity = r.area.single() && v.dim && v.dim->is_dimensionless() &&
                                      labelled_a_specific_gravity(r.sheet, r.area.first);
            target.vacuum = r.area.single() && v.dim && v.offset == nullptr &&
                            labelled_a_vacuum(r.sheet, r.area.first);
            target.stress = r.area.single() && v.dim && v.offset == nullptr &&
                            labelled_a_stress(r.sheet, r.area.first);
            target.round =
                r.area.single() && v.dim && *v.dim == dimension::base(base_dimension::length)
                    ? labelled_round(r.sheet, r.area.first)
                    : round_length::none;
            target.unit_text =
                v.unit != nullptr ? std::string_view(v.unit->unit.text) : std::string_view();
            note_reference_state(target, v.unit != nullptr ? std::string_view(v.unit->unit.text)
                                                           : std::string_view());
        }
        const std::size_t before = out_.size();
        // A copy: the tree's vectors stay put while cells are checked, but nothing here
        // should depend on that.
        const syntax::formula formula = lowered_.tree.formulas[f.lowered.formula];
        if (written == nullptr) [[unlikely]]
            if ((written = ton_by_what_is_computed(f, formula)) != nullptr)
                f.result = from_unit(*written);
        // The verdict first: where the notation finds nothing wrong with "written unit =
        // formula", its notes are all there is to say, and the formula is not read again.
        std::optional<std::vector<diagnostic>> verdict;
        if (written != nullptr && f.lowered.not_checked.empty()) {
            const std::uint32_t root = lowered_.tree.sides[formula.first_side].root;
            // Asked of a specific energy only (names_specific_enthalpy).
            const bool enthalpy = labelled_an_enthalpy(f.sheet, f.source->at);
            // "Δ°C", "Δ°F": a temperature written for the cell as a difference, which a
            // reading less a reference (=C6-15) gives, as a symbol declared in Δ°C takes it.
            const bool difference_unit =
                written->unit.offset == nullptr && written->unit.text.starts_with("\u0394") &&
                written->unit.dim == dimension::base(base_dimension::temperature);
            verdict =
                equation_.check(root, f.written_text, written->unit, difference_unit, enthalpy);
            // "Range | =C6-C7 | °F": a cell whose row label says it holds a difference, and
            // whose formula computes one; a reading there ("Mean / range", =AVERAGE(...))
            // was already right as a reading.
            if (has_fault(*verdict) && labelled_a_difference(f.sheet, f.source->at))
                if (auto as_difference =
                        equation_.check(root, f.written_text, written->unit, true, enthalpy);
                    !has_fault(as_difference))
                    verdict = std::move(as_difference);
            // "Pressure drop across the regulators | =C50-C54 | bar" with C50 in bar a and C54
            // in bar(g): an absolute reading less a gauge one is the atmosphere, a reading,
            // where the row says a drop between two pressures; checked as the drop it says.
            if (!has_fault(*verdict) && absolute_less_gauge(root) &&
                labelled_a_difference(f.sheet, f.source->at))
                if (auto as_difference =
                        equation_.check(root, f.written_text, written->unit, true, enthalpy);
                    has_fault(as_difference))
                    verdict = std::move(as_difference);
            if (!has_unit_fault(*verdict)) {
                take_verdict(*verdict, f, formula);
                ++report_.cells_checked;
                ++report_.formulas_checked;
                if (record_cells_)
                    checked_cells_.push_back(id);
                return;
            }
        }
        const std::optional<value_type> computed =
            check_sheet_formula(lowered_.tree, formula, no_symbols_, out_);
        bool not_checked = !f.lowered.not_checked.empty();
        for (std::size_t k = before; k < out_.size(); ++k)
            not_checked = adapt(out_[k], f) || not_checked;
        if (not_checked) {
            if (!f.lowered.not_checked.empty())
                report(severity::warning, rules::not_checked,
                       fmt::format("{}, so this cell is not checked", f.lowered.not_checked),
                       formula.range);
            ++report_.cells_not_checked;
            return;
        }
        ++report_.cells_checked;
        ++report_.formulas_checked;
        if (record_cells_)
            checked_cells_.push_back(id);
        if (computed && !written) {
            f.result.dim = computed->dim;
            f.result.scale = computed->scale;
            f.result.exact_scale = computed->exact_scale;
            f.result.offset = computed->offset;
            report_unread_unit(f);
            return;
        }
        if (!written) {
            report_unread_unit(f);
            return;
        }
        if (computed && out_.size() == before && !range_reported)
            compare_with_written(f, formula, *computed, *written);
        // The notation found a fault: the workbook's words for it stand where they find one
        // too, and give way to the notation's where they do not.
        if (verdict && !has_fault({out_.data() + before, out_.size() - before}) &&
            !(computed && computed->numeric && computed->dim.is_dimensionless())) {
            out_.resize(before);
            take_verdict(*verdict, f, formula);
        } else if (verdict &&
                   faults_moved(
                       {out_.data() + before, out_.size() - before}, *verdict,
                       lowered_.tree.nodes[lowered_.tree.sides[formula.first_side].root].range)) {
            // The same faults, in other places: the notation's, which knew the unit written
            // for the cell, say which term of a sum is off ("=C22*C23 + C24" in kW, C24 in kW).
            out_.resize(before);
            take_verdict(*verdict, f, formula);
        } else if (verdict && number_read_as_quantity({out_.data() + before, out_.size() - before},
                                                      *verdict)) {
            // "=C16/2.31" into ft from psi: the notation, which knew the cell's unit, read the
            // 2.31 as water's feet per psi and found it turned over; the formula alone leaves
            // it a plain number and reports the dimension.
            out_.resize(before);
            take_verdict(*verdict, f, formula);
        } else if (verdict &&
                   zero_against_scale({out_.data() + before, out_.size() - before}, *verdict)) {
            // "=C47*14.5+14.7" into psig from bar(g): the notation, which knew the cell's unit,
            // read the 14.5 as the conversion and the 14.7 as the atmosphere added; the formula
            // alone leaves the 14.5 a coefficient and reports a scale that is none.
            out_.resize(before);
            take_verdict(*verdict, f, formula);
        }
    }

    // Whether the workbook's own words found only a dimension where the notation, reading a
    // number as the quantity it carries, found the sides to agree in dimension and named a
    // factor turned over.
    static bool number_read_as_quantity(std::span<const diagnostic> workbook,
                                        std::span<const diagnostic> notation) {
        const bool dimension_only =
            !workbook.empty() &&
            std::all_of(workbook.begin(), workbook.end(), [](const diagnostic& d) {
                return d.level == severity::note || d.rule == rules::result_unit ||
                       d.rule == rules::side_mismatch;
            });
        const bool turned_over =
            std::any_of(notation.begin(), notation.end(), [](const diagnostic& d) {
                return d.level != severity::note && d.rule == rules::unit_scale &&
                       d.message.find("wrong way round") != std::string::npos;
            });
        const bool notation_dimension =
            std::any_of(notation.begin(), notation.end(), [](const diagnostic& d) {
                return d.level != severity::note && d.rule == rules::side_mismatch;
            });
        return dimension_only && turned_over && !notation_dimension;
    }

    // Whether the notation found the atmosphere, a gauge scale's zero, where the workbook's own
    // words found only a factor of scale. (A temperature conversion run the wrong way is
    // better told in the workbook's words.)
    static bool zero_against_scale(std::span<const diagnostic> workbook,
                                   std::span<const diagnostic> notation) {
        const auto faults_under = [](std::span<const diagnostic> found, std::string_view rule) {
            return std::any_of(found.begin(), found.end(), [&](const diagnostic& d) {
                return d.level != severity::note && d.rule == rule;
            });
        };
        // Or "=(C20-32)/1.8+273.15" into °C: the kelvins' 273.15 added, which the notation
        // names, where the formula alone finds the 1.8 a coefficient.
        const bool atmosphere =
            std::any_of(notation.begin(), notation.end(), [](const diagnostic& d) {
                return d.level != severity::note && d.rule == rules::offset_scale &&
                       (d.message.find("atmosphere") != std::string::npos ||
                        std::any_of(d.notes.begin(), d.notes.end(), [](const auto& n) {
                            return n.message.find("takes a reading to") != std::string::npos;
                        }));
            });
        // "=101.325-3.386*C12" with C12 a vacuum: the formula alone cannot tell which term
        // is the sum's, and finds the number dimensionless; beside the cell's unit the
        // notation reads the atmosphere the vacuum counts down from.
        return atmosphere && !faults_under(workbook, rules::offset_scale) &&
               std::all_of(workbook.begin(), workbook.end(), [](const diagnostic& d) {
                   return d.level == severity::note || d.rule == rules::unit_scale ||
                          d.rule == rules::sum_mismatch;
               });
    }

    // Whether two checks of a cell found faults under the same rules, but not all in the same
    // places, each inside the formula (terms of a sum), none on the whole of it.
    static bool faults_moved(std::span<const diagnostic> a, std::span<const diagnostic> b,
                             span whole) {
        using fault = std::tuple<std::string_view, std::uint32_t, std::uint32_t>;
        const auto faults = [&](std::span<const diagnostic> found) {
            std::vector<fault> out;
            for (const auto& d : found)
                if (d.level != severity::note)
                    out.emplace_back(d.rule,
                                     d.where.range.begin == whole.begin &&
                                             d.where.range.end == whole.end
                                         ? 0U
                                         : d.where.range.begin,
                                     d.where.range.end);
            std::sort(out.begin(), out.end());
            return out;
        };
        const std::vector<fault> x = faults(a);
        const std::vector<fault> y = faults(b);
        if (x.empty() || x.size() != y.size() || x == y)
            return false;
        for (std::size_t i = 0; i < x.size(); ++i)
            if (std::get<0>(x[i]) != std::get<0>(y[i]) || std::get<1>(x[i]) == 0 ||
                std::get<1>(y[i]) == 0)
                return false;
        return true;
    }

    static bool has_fault(std::span<const diagnostic> found) {
        return std::any_of(found.begin(), found.end(),
                           [](const diagnostic& d) { return d.level != severity::note; });
    }

    // A fault of the units, as against a warning about a number the units agree with (an SG
    // on the wrong side of water's 0.433, standard air's 1.08 on an actual flow): the cell's
    // own check would only restate the units without the number's reading.
    static bool has_unit_fault(std::span<const diagnostic> found) {
        return std::any_of(found.begin(), found.end(), [](const diagnostic& d) {
            return d.level != severity::note && d.rule != rules::gravity_number &&
                   d.rule != rules::trade_constant;
        });
    }

    // The notation's findings on the cell as the equation "written unit = formula", in a
    // workbook's words.
    void take_verdict(std::vector<diagnostic>& verdict, const formula_cell& f,
                      const syntax::formula& formula) {
        for (auto& d : verdict) {
            in_workbook_words(d, formula.range);
            out_.push_back(std::move(d));
            adapt(out_.back(), f);
        }
    }

    // Checker findings in a workbook's words; true when the cell cannot be checked.
    bool adapt(diagnostic& d, const formula_cell& f) {
        if (d.rule == rules::unknown_function) {
            d.level = severity::warning;
            d.rule = std::string(rules::not_checked);
            d.message = fmt::format("{}: plumb does not know this function, so this cell is not "
                                    "checked",
                                    d.message.substr(0, d.message.find(" is not")));
            return true;
        }
        // Numbers in a workbook carry no units: terms in different units give a wrong result.
        if (d.rule == rules::unit_scale)
            d.level = severity::error;
        advice_in_workbook_words(d);
        std::size_t noted = 0;
        for (auto& t : d.terms) {
            for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
                const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
                if (r.where.begin < t.where.range.begin || r.where.end > t.where.range.end)
                    continue;
                if (r.where.begin == t.where.range.begin && r.where.end == t.where.range.end) {
                    t.sheet = book_.sheets[r.sheet].name;
                    t.cell = a1_name(r.area);
                }
                const cell_value v = note_value(r);
                if (!v.dim || noted >= 6)
                    continue;
                ++noted;
                const std::string remark = v.describe_for(reference_name(r, f.sheet));
                if (std::none_of(d.notes.begin(), d.notes.end(),
                                 [&](const note& n) { return n.message == remark; }))
                    d.notes.push_back({remark, {}});
            }
        }
        return false;
    }

    cell_value note_value(const lowered_reference& r) {
        if (r.area.single()) {
            if (const cell* c = book_.sheets[r.sheet].find(r.area.first))
                return c->kind == cell_kind::formula
                           ? formulas_[formula_at_.at(book_key(r.sheet, c->at))].result
                           : (unit_of(r.sheet, c->at) ? from_unit(*unit_of(r.sheet, c->at))
                                                      : cell_value{});
            return {};
        }
        const auto it = range_cache_.find(
            std::tuple{r.sheet, sheet::key(r.area.first), sheet::key(r.area.last)});
        return it == range_cache_.end() ? cell_value{} : it->second;
    }

    // Calls `visit(node, exponent)` for each factor of the outermost product under `root`,
    // with the power it enters with (a divisor -1, (B4/1000)^2 -2), left to right, until it
    // returns false; returns whether every factor was visited.
    template <class Visit>
    bool for_each_top_factor(std::uint32_t root, double root_exponent, Visit&& visit) const {
        // Over an explicit stack: a product of 100,000 cells must not recurse once per factor.
        std::vector<std::pair<std::uint32_t, double>> pending{{root, root_exponent}};
        while (!pending.empty()) {
            const auto [node, exponent] = pending.back();
            pending.pop_back();
            const auto& n = lowered_.tree.nodes[node];
            switch (n.kind) {
            case syntax::expr_kind::group:
                pending.emplace_back(n.lhs, exponent);
                break;
            case syntax::expr_kind::multiply:
            case syntax::expr_kind::divide:
                pending.emplace_back(n.rhs,
                                     n.kind == syntax::expr_kind::divide ? -exponent : exponent);
                pending.emplace_back(n.lhs, exponent); // taken first
                break;
            case syntax::expr_kind::power:
                if (lowered_.tree.nodes[n.rhs].kind == syntax::expr_kind::number)
                    if (const auto e =
                            rational::parse(listing_->text(lowered_.tree.nodes[n.rhs].range))) {
                        pending.emplace_back(n.lhs, exponent * e->to_double());
                        break;
                    }
                if (!visit(node, exponent))
                    return false;
                break;
            default:
                if (!visit(node, exponent))
                    return false;
                break;
            }
        }
        return true;
    }

    // The numbers multiplied into the formula's result, each with its power: the outermost
    // product only, where a conversion factor written into a formula stands. Each keeps the
    // interval its printed digits stand for.
    void top_factors(std::uint32_t root, double root_exponent,
                     std::vector<scale_literal>& out) const {
        for_each_top_factor(root, root_exponent, [&](std::uint32_t node, double exponent) {
            const auto& n = lowered_.tree.nodes[node];
            if (n.kind != syntax::expr_kind::number)
                return true;
            const std::string_view text = listing_->text(n.range);
            const auto v = rational::parse(text);
            if (v && !v->is_zero() && out.size() < 32) {
                scale_literal l = read_literal(text, v->to_double(), node, v);
                l.exponent = exponent;
                out.push_back(l);
            }
            return true;
        });
    }

    // =B4*9.81*B5 beside Pa: standard gravity written as a number, as in the notation (see
    // check/gravity_number.hpp). On a reading, the formula's value takes the cell's dimension,
    // the number leaves the factors, and the note is made; the scale is then compared as for
    // any formula.
    bool read_gravity_in_cell(const formula_cell& f, value_type& computed, const cell_unit& written,
                              std::vector<scale_literal>& factors) {
        if (factors.empty() || factors.size() > 8)
            return false;
        dimension lacking;
        try {
            lacking = written.unit.dim / computed.dim;
        } catch (const std::exception&) {
            return false;
        }
        std::array<std::string_view, 8> texts{};
        for (std::size_t k = 0; k < factors.size(); ++k)
            texts[k] = listing_->text(lowered_.tree.nodes[factors[k].node].range);
        unsigned clock_units = clock_units_in(written.unit.text);
        // "=C34*C35/100/C29" with C35 in %: the 100 is the percentage's, never one over
        // water's density that the % makes of it.
        bool beside_percentage = false;
        for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
            const std::string_view unit =
                lowered_.tree
                    .references[lowered_.references[f.lowered.first_reference + i].reference]
                    .unit_text;
            clock_units |= clock_units_in(unit);
            beside_percentage = beside_percentage || unit == "%";
        }
        const auto reading = read_gravity_number(
            computed.scale, written.unit.scale, factors, {texts.data(), factors.size()}, lacking,
            false, carried_quantity::term_kind::any, clock_units, beside_percentage);
        if (!reading)
            return false;
        const std::uint32_t node = factors[reading->literal].node;
        const std::string_view number = texts[reading->literal];

        computed.dim = written.unit.dim;
        computed.scale = reading->term_scale;
        computed.exact_scale.reset();
        factors.erase(factors.begin() + static_cast<std::ptrdiff_t>(reading->literal));
        diagnostic& d = report(severity::note, reading->quantity->rule,
                               gravity_message(number, *reading), lowered_.tree.nodes[node].range);
        d.notes.push_back({std::string(reading->quantity->advice_in_cell), {}});
        return true;
    }

    // =B2*B3/3960 with B3 in m (check/constant_in_other_units.hpp): once the number is no
    // quantity in the units around it, say which unit it was written for. Every factor of the
    // outermost product must be a cell or a number, the cell's own unit weighed with them.
    void note_constant_in_other_units(diagnostic& d, const value_type& computed,
                                      const cell_unit& written,
                                      const std::vector<scale_literal>& factors,
                                      std::uint32_t root) const {
        if (factors.empty() || factors.size() > 8 || computed.offset != nullptr ||
            written.unit.offset != nullptr || !(computed.scale > 0) ||
            !std::isfinite(computed.scale))
            return;
        dimension lacking;
        std::optional<compact_dimension> written_dim;
        try {
            lacking = written.unit.dim / computed.dim;
            written_dim = compact_dimension::fitted(written.unit.dim);
        } catch (const std::exception&) {
            return;
        }
        if (!written_dim)
            return;
        std::array<std::string_view, 8> texts{};
        for (std::size_t k = 0; k < factors.size(); ++k)
            texts[k] = listing_->text(lowered_.tree.nodes[factors[k].node].range);
        std::array<declared_factor, 8> cells{};
        std::array<std::string, 8> names{};
        std::size_t count = 0;
        // A function's value or a sum might hold the unit that is off: no note then.
        const bool weighed =
            for_each_top_factor(root, 1.0, [&](std::uint32_t node, double exponent) {
                const auto& n = lowered_.tree.nodes[node];
                if (n.kind == syntax::expr_kind::number)
                    return true;
                if (n.kind != syntax::expr_kind::reference)
                    return false;
                const syntax::reference_value& cell = lowered_.tree.references[n.lhs];
                // With the result on no scale, a cell in °C or °F here is a difference.
                const auto dim = cell.dim ? compact_dimension::fitted(*cell.dim) : std::nullopt;
                if (!dim || count + 1 == cells.size())
                    return false;
                names[count] = fmt::format("'{}'", listing_->text(n.range));
                cells[count++] = {*dim, cell.scale, exponent,
                                  cell.offset != nullptr ? cell.offset->symbol
                                                         : std::string_view{}};
                return true;
            });
        if (!weighed)
            return;
        names[count] = "the result";
        cells[count++] = {*written_dim, written.unit.scale, -1.0, written.unit.text};
        const auto found = read_constant_in_other_units(
            computed.scale, written.unit.scale, factors, {texts.data(), factors.size()}, lacking,
            carried_quantity::term_kind::any, {cells.data(), count});
        if (!found)
            return;
        d.notes.push_back(
            {constant_in_other_units_message(fmt::format("'{}'", texts[found->reading.literal]),
                                             names[found->factor], *found),
             {}});
    }

    // "=C37+1.01325" under psia with C37 in psig: the atmosphere was added, but in bar; in the
    // cell's unit it is another number (14.696 psi).
    void note_atmosphere_in_other_unit(diagnostic& d, const syntax::formula& formula,
                                       const written_unit& cell_unit) const {
        const std::uint32_t root =
            syntax::inside_brackets(lowered_.tree, lowered_.tree.sides[formula.first_side].root);
        const syntax::expr_node& sum = lowered_.tree.nodes[root];
        if (sum.kind != syntax::expr_kind::add)
            return;
        std::uint32_t number = syntax::no_index;
        for (const std::uint32_t side : {sum.lhs, sum.rhs})
            if (lowered_.tree.nodes[side].kind == syntax::expr_kind::number)
                number = side;
        if (number == syntax::no_index)
            return;
        const std::string_view written = listing_->text(lowered_.tree.nodes[number].range);
        const double value = read_number(written).literal.value;
        const compact_dimension pressure(cell_unit.dim);
        for (const auto& u : pressure_units)
            if (std::abs(cell_unit.scale / u.pascals - 1.0) > 5e-3 &&
                read_reference_state(pressure, value, written, u.pascals) != nullptr) {
                // "Site barometric pressure | 14.2 | psia" in C13: the atmosphere to add is
                // that row's, in the cell's unit, not the sea level's.
                if (const auto& site = lowered_.tree.barometer; site && site->pascals > 0.0)
                    d.notes.push_back(
                        {fmt::format(
                             "{} is the atmosphere at sea level in {}, not in {}, the "
                             "cell's unit; the sheet's barometer {} is {} {}",
                             written, u.name, cell_unit.text, site->cell,
                             format_factor(std::round(site->pascals / cell_unit.scale * 1000.0) /
                                           1000.0),
                             cell_unit.text),
                         {}});
                else
                    d.notes.push_back(
                        {fmt::format("{} is the atmosphere in {}, not in {}, the cell's unit: in "
                                     "{} it is {}",
                                     written, u.name, cell_unit.text, cell_unit.text,
                                     format_factor(101325.0 / cell_unit.scale)),
                         {}});
                return;
            }
    }

    void compare_with_written(const formula_cell& f, const syntax::formula& formula,
                              value_type computed, const cell_unit& written) {
        // "=55" or "=IF(C18<=55,55,75)" beside kW (a motor size picked from a list): numbers
        // alone carry no unit, and are in the one written beside them, as a typed input is
        // (the notation's verdict on the cell is set aside for it too).
        if (computed.zero || (computed.numeric && computed.dim.is_dimensionless()))
            return;
        const std::string where_unit = fmt::format("'{}' ({})", written.unit.text, written.origin);
        std::vector<scale_literal> factors;
        top_factors(lowered_.tree.sides[formula.first_side].root, 1.0, factors);
        if (!(computed.dim == written.unit.dim))
            read_gravity_in_cell(f, computed, written, factors);
        if (!(computed.dim == written.unit.dim)) {
            diagnostic& d =
                report(severity::error, rules::result_unit,
                       fmt::format("this formula computes {}, but the unit written for its cell, "
                                   "{}, is {}",
                                   describe(computed.dim), where_unit, describe(written.unit.dim)),
                       formula.range);
            d.terms.push_back({{listing_, formula.range},
                               std::string(listing_->text(formula.range)),
                               computed.dim,
                               {},
                               {}});
            add_input_notes(d, f);
            note_gravity_apart(d, computed.dim, written.unit.dim);
            note_ton_of_refrigeration(d, computed.dim, written);
            note_constant_in_other_units(d, computed, written, factors,
                                         lowered_.tree.sides[formula.first_side].root);
            return;
        }
        const bool uses_offset_values = [&] {
            for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i)
                if (lowered_.tree
                        .references[lowered_.references[f.lowered.first_reference + i].reference]
                        .offset != nullptr)
                    return true;
            return false;
        }();
        // Two gauge units count from one zero, the atmosphere (mbar(g) and inH2Og): between
        // them only the size of the unit differs, which the scale check below weighs.
        const bool one_zero = written.unit.offset != nullptr && computed.offset != nullptr &&
                              std::abs(written.unit.offset->offset - computed.offset->offset) <=
                                  1e-9 * std::abs(computed.offset->offset);
        // A column of water ("in. w.c.", ftH2O) is read on a gauge, or is a drop: a gauge
        // reading converted into it, or it into a gauge unit, keeps the atmosphere's zero
        // (common practice: gas supply and fan pressures in inches of water are gauge).
        const auto water_column = [](const unit_definition* offset, double scale) {
            return offset == nullptr && is_water_column(scale);
        };
        const auto on_gauge = [](const unit_definition* offset) {
            return offset != nullptr && offset->scale == unit_scale::gauge;
        };
        const bool column_on_gauge =
            (on_gauge(computed.offset) && water_column(written.unit.offset, written.unit.scale)) ||
            (on_gauge(written.unit.offset) && water_column(computed.offset, computed.scale));
        if (written.unit.offset != computed.offset && !one_zero && !column_on_gauge &&
            (computed.offset != nullptr || !uses_offset_values)) {
            const unit_definition* on_scale =
                computed.offset != nullptr ? computed.offset : written.unit.offset;
            const bool temperature =
                on_scale->exponents[static_cast<std::size_t>(base_dimension::temperature)] != 0;
            // "=4.19*C19" with C19 in °C under kJ/kg: a reading times a property, reckoned from
            // the scale's zero, in a unit that is neither a temperature nor a pressure.
            if (computed.offset != nullptr && written.unit.offset == nullptr &&
                !(computed.dim == on_scale->dim())) {
                diagnostic& d = report(
                    severity::error, rules::offset_scale,
                    fmt::format("this formula gives a value reckoned from the zero of the {} "
                                "scale, but the unit written for its cell, {}, has no such zero: "
                                "the value depends on where that zero is",
                                computed.offset->symbol, where_unit),
                    formula.range);
                d.notes.push_back({fmt::format("a {} reading times a quantity counts from 0 {}: "
                                               "write a difference of readings (t - t_ref) for "
                                               "a change; an enthalpy from a datum (water's "
                                               "from 0 °C in steam tables) is a convention to "
                                               "accept with a reviewed note",
                                               computed.offset->symbol, computed.offset->symbol),
                                   {}});
                add_input_notes(d, f);
                return;
            }
            diagnostic& d = report(
                severity::error, rules::offset_scale,
                computed.offset != nullptr && written.unit.offset != nullptr
                    ? fmt::format("this formula gives a value on the {} scale, but the unit "
                                  "written for its cell, {}, is on the {} scale: the value is "
                                  "off by the difference of the scales' zeros",
                                  computed.offset->symbol, where_unit, written.unit.offset->symbol)
                : computed.offset != nullptr
                    ? fmt::format("this formula gives a value on the {} scale, but the unit "
                                  "written for its cell, {}, is {}: the value is off by the "
                                  "scale's zero",
                                  computed.offset->symbol, where_unit,
                                  temperature ? "an absolute temperature" : "an absolute pressure")
                    : fmt::format("this formula gives {}, but the unit written for its cell, {}, "
                                  "is on the {} scale: the value is off by the scale's zero",
                                  temperature ? "an absolute temperature" : "an absolute pressure",
                                  where_unit, written.unit.offset->symbol),
                formula.range);
            d.notes.push_back(
                {temperature ? temperature_conversion_advice(computed.offset, written.unit.offset)
                             : std::string("add or subtract the atmospheric "
                                           "pressure, or write the unit the "
                                           "formula gives"),
                 {}});
            if (!temperature)
                note_atmosphere_in_other_unit(d, formula, written.unit);
            add_input_notes(d, f);
            return;
        }
        const double needed = computed.scale / written.unit.scale;
        if (!std::isfinite(needed))
            return;
        // The numbers written into the formula reconcile its units with the cell's when some of
        // them, each anywhere within half a unit of its last printed digit (3.281 for 3.28084),
        // make up the ratio exactly: the rule of the notation's checker.
        const std::array<scaled_operand, 2> parts{
            scaled_operand{computed.scale, computed.exact_scale ? &*computed.exact_scale : nullptr,
                           factors},
            scaled_operand{written.unit.scale,
                           written.unit.exact_scale ? &*written.unit.exact_scale : nullptr,
                           {}}};
        if (reconcile(parts).agree)
            return;
        bool reversed = false;
        std::size_t reversed_at = 0;
        for (std::size_t k = 0; k < factors.size() && k < 10 && !reversed; ++k)
            if (reconcile(parts, {0, k}).agree) {
                reversed = true;
                reversed_at = k;
            }
        if (!reversed && report_near_factor(f, factors, computed, written, needed))
            return;
        // How far off the value shown is: after the numbers already written, when what is
        // left is a clean power of ten (a missed "/1000"); otherwise after the numbers that
        // are conversions (*1000, *5.615, /24, /3600), which the engineer meant as such, the
        // others (0.87, 5/384, /4) being coefficients of the formula.
        double written_product = 1.0;
        double conversions = 1.0;
        double doubt = 0.0;   // the conversions' rounding, relative
        double printed = 0.0; // every written number's rounding, relative
        double trade_conversions = 1.0;
        for (const auto& x : factors) {
            const double factor = std::pow(x.value, x.exponent);
            written_product *= factor;
            printed += x.tolerance * std::abs(x.exponent);
            // The fan trade's 6356 stands for 6343.3 with a real inch of water (see
            // check/trade_constants.hpp): the value is off by the decade within that too.
            // It converts as it stands, so the value shown is off by what the units leave
            // over it ("=cfm*in.w.g./(6356*η)" typed under kW: the 1.341 of hp to kW).
            if (const trade_constant* c = trade_constant_of(x)) {
                const double apart = std::abs(x.value / c->exact_conversion.to_double() - 1.0);
                printed += apart * std::abs(x.exponent);
                trade_conversions *= factor;
            }
            if (looks_like_conversion(x, true) || is_time_ratio(x)) {
                conversions *= factor;
                doubt += x.tolerance * std::abs(x.exponent);
            }
        }
        // "=C37*14.5" from kPa(g) into psig: 14.5 is the psi per bar, rounded (14.5038), and
        // what is left is the 100 of bar to kPa, within that rounding.
        const double left = needed / written_product;
        const double decades = std::log10(std::abs(left));
        const bool clean_decade =
            std::round(decades) != 0 &&
            std::abs(decades - std::round(decades)) <= std::log10(1.0 + printed) + 1e-9;
        const double off =
            clean_decade
                ? std::copysign(std::pow(10.0, std::round(decades)), left)
                : whole_within(needed / (conversions * trade_conversions), doubt).value_or(needed);
        const std::optional<rational> exact_needed =
            exact_product(computed.exact_scale, written.unit.exact_scale, true);
        const std::optional<rational> exact_inverse =
            exact_product(rational(1), exact_needed, true);
        const bool whole_ratio = off == needed;
        const std::string off_text =
            off >= 1 ? format_factor(whole_ratio ? exact_needed : std::nullopt, off)
                     : format_factor(whole_ratio ? exact_inverse : std::nullopt, 1.0 / off);
        // "=C34*0.5933": the factor stated leaves out a number that converts nothing here;
        // say so, since it may be the conversion the engineer meant, wrongly (as the notation's
        // checker says it), and do not call the units' ratio the value's.
        std::string coefficients;
        for (const auto& x : factors) {
            const std::string_view text = listing_->text(lowered_.tree.nodes[x.node].range);
            // Written to four digits or more, as conversions are (0.5933, 3.517); a 0.87 or a
            // 384 is the formula's own, and the value shown is off by the units alone.
            // Nor a trade's constant (the fan's 6356), which is right where it stands.
            if (x.value != 1.0 && x.table_digits && !looks_like_conversion(x, true) &&
                !is_time_ratio(x) && coefficients.size() < 80 && off != left &&
                trade_constant_of(x) == nullptr)
                coefficients += fmt::format("{}{}", coefficients.empty() ? "" : ", ", text);
        }
        std::optional<std::string> backwards =
            reversed ? fahrenheit_run_backwards(f, formula, written) : std::nullopt;
        diagnostic& d = report(
            severity::error, rules::unit_scale,
            reversed ? fmt::format("the conversion factor in this formula is the wrong way round: "
                                   "to give {} it must multiply by {}, but it multiplies by {}",
                                   written.unit.text, format_factor(exact_needed, needed),
                                   format_factor(exact_inverse, 1.0 / needed))
            : coefficients.empty()
                ? fmt::format("as written, this formula does not give {}, the unit written "
                              "for its cell: the value shown is {} times too {}",
                              where_unit, off_text, off >= 1 ? "small" : "large")
                : fmt::format("as written, this formula does not give {}, the unit written "
                              "for its cell: its units are {} times too {} for it, its "
                              "coefficient {} aside",
                              where_unit, off_text, off >= 1 ? "small" : "large", coefficients),
            formula.range);
        if (backwards) {
            d.message = fmt::format("the temperature conversion in this formula runs the wrong "
                                    "way for {}",
                                    written.unit.text);
            d.notes.push_back({std::move(*backwards), {}});
        } else if (reversed && std::abs(factors[reversed_at].exponent) == 1.0 &&
                   factors[reversed_at].value > 0) {
            // "=C67/(C68/100)/3.6" into GJ from MWh: the factor turned is the 3.6, whatever
            // else the formula scales by (a % over 100 beside it), and the message names it.
            const scale_literal& x = factors[reversed_at];
            const bool divides = x.exponent < 0;
            const double apart = x.value * x.value;
            d.message = fmt::format("the conversion factor {} in this formula is the wrong way "
                                    "round: to give {} it must {} it, not {} it",
                                    listing_->text(lowered_.tree.nodes[x.node].range),
                                    written.unit.text, divides ? "multiply by" : "divide by",
                                    divides ? "divide by" : "multiply by");
            d.notes.push_back({fmt::format("as written the value shown is {} times too {}",
                                           format_factor(apart >= 1 ? apart : 1.0 / apart),
                                           (apart >= 1) == divides ? "small" : "large"),
                               {}});
        }
        if (!reversed) {
            d.notes.push_back({fmt::format("its inputs give numbers in units of {} {}; "
                                           "convert them in the formula, or write the unit they "
                                           "give",
                                           format_factor(exact_needed, needed), written.unit.text),
                               {}});
            if (!coefficients.empty())
                d.notes.push_back(
                    {fmt::format("{} counted as a coefficient, not a unit conversion; if it was "
                                 "meant to convert units, it is not the factor these units need",
                                 coefficients),
                     {}});
        }
        add_input_notes(d, f);
    }

    // "=(B8-32)/1.8" under °F with B8 in °C: the °F-to-°C conversion applied to a °C reading,
    // whose fix is the other conversion, not the 1.8 turned over (=(B8-32)*1.8 is still no
    // °F reading); and "=1.8*B8+32" under °C with B8 in °F.
    std::optional<std::string> fahrenheit_run_backwards(const formula_cell& f,
                                                        const syntax::formula& formula,
                                                        const cell_unit& written) const {
        const auto scale_of = [](const unit_definition* u) {
            if (u == nullptr ||
                u->exponents[static_cast<std::size_t>(base_dimension::temperature)] != 1)
                return 0;
            if (std::abs(u->factor - 1.0) < 1e-12)
                return 1; // the Celsius scale
            return std::abs(u->factor * 1.8 - 1.0) < 1e-9 ? 2 : 0;
        };
        if (f.lowered.reference_count != 1)
            return std::nullopt;
        const int wanted = scale_of(written.unit.offset);
        const int read = scale_of(
            lowered_.tree.references[lowered_.references[f.lowered.first_reference].reference]
                .offset);
        const syntax::parsed_file& tree = lowered_.tree;
        std::string_view cell;
        bool less_32 = false;
        bool plus_32 = false;
        syntax::search_subtree(tree, tree.sides[formula.first_side].root,
                               [&](std::uint32_t, const syntax::expr_node& n) {
                                   if (n.kind == syntax::expr_kind::reference)
                                       cell = listing_->text(n.range);
                                   else if ((n.kind == syntax::expr_kind::subtract ||
                                             n.kind == syntax::expr_kind::add) &&
                                            tree.nodes[n.rhs].kind == syntax::expr_kind::number &&
                                            listing_->text(tree.nodes[n.rhs].range) == "32")
                                       (n.kind == syntax::expr_kind::subtract ? less_32 : plus_32) =
                                           true;
                                   return syntax::search_step::descend;
                               });
        if (cell.empty())
            return std::nullopt;
        if (less_32 && read == 1 && wanted == 2)
            return fmt::format("(t - 32)/1.8 turns a \u00B0F reading into \u00B0C, but {} is in "
                               "\u00B0C already and the cell wants \u00B0F: the conversion runs "
                               "the other way, ={}*1.8+32",
                               cell, cell);
        if (plus_32 && read == 2 && wanted == 1)
            return fmt::format("1.8*t + 32 turns a \u00B0C reading into \u00B0F, but {} is in "
                               "\u00B0F already and the cell wants \u00B0C: the conversion runs "
                               "the other way, =({}-32)/1.8",
                               cell, cell);
        return std::nullopt;
    }

    // The ratio as a whole number either way (60, 1/3600) where the rounding of the
    // conversions written (5.615 for 5.6146) is all that keeps it from one; else as it is.
    // The trade's constant a number is printed as (the fan's 6356, water's 8.34), or null.
    static const trade_constant* trade_constant_of(const scale_literal& x) {
        const std::optional<rational> printed = printed_power(x, 1.0);
        return printed ? trade_constant_for(*printed) : nullptr;
    }

    static std::optional<double> whole_within(double ratio, double doubt) {
        if (!(ratio > 0) || !std::isfinite(ratio))
            return std::nullopt;
        const double big = ratio >= 1 ? ratio : 1.0 / ratio;
        const double whole = std::round(big);
        if (whole >= 1 && std::abs(big / whole - 1.0) <= doubt + 1e-9)
            return ratio >= 1 ? whole : 1.0 / whole;
        return ratio;
    }

    // "=B1*2.204" for kg to lb (2.20462): a number within 1 % of the conversion the units need,
    // but not that conversion rounded. Says which factor, and what it should read.
    bool report_near_factor(const formula_cell& f, std::span<const scale_literal> factors,
                            const value_type& computed, const cell_unit& written, double needed) {
        for (const scale_literal& l : factors) {
            if (std::abs(l.exponent) != 1.0)
                continue;
            const double wanted = l.exponent > 0 ? needed : 1.0 / needed;
            if (std::abs(l.value / wanted - 1.0) > 0.01)
                continue;
            const std::string_view text = listing_->text(lowered_.tree.nodes[l.node].range);
            const std::size_t point = text.find('.');
            const int decimals =
                point == std::string_view::npos ? 0 : static_cast<int>(text.size() - point - 1);
            const std::optional<rational> exact_needed =
                exact_product(computed.exact_scale, written.unit.exact_scale, true);
            const std::optional<rational> exact_wanted =
                l.exponent > 0 ? exact_needed : exact_product(rational(1), exact_needed, true);
            diagnostic& d = report(
                severity::error, rules::unit_scale,
                fmt::format("the factor {} is near the conversion to {} but is not it: the units "
                            "need {} ({:.6g}), which to {} decimal{} reads {:.{}f}",
                            text, written.unit.text, format_factor(exact_wanted, wanted), wanted,
                            decimals, decimals == 1 ? "" : "s", wanted, decimals),
                lowered_.tree.nodes[l.node].range);
            d.notes.push_back({fmt::format("as written the value shown is off by a factor of "
                                           "{:.6g}",
                                           wanted / l.value),
                               {}});
            add_input_notes(d, f);
            return true;
        }
        return false;
    }

    // "ft/ton" beside a cooling load in TR: 'ton' is the short ton, a mass, and the result
    // differs from it by exactly a power per mass; the refrigeration trade's ton is TR.
    static void note_ton_of_refrigeration(diagnostic& d, const dimension& computed,
                                          const cell_unit& written) {
        if (auto note = ton_of_refrigeration_note(written.unit.text, computed / written.unit.dim))
            d.notes.push_back({std::move(*note), {}});
    }

    // "=C6*C7*C8/1000" into kW from kg/m³, m³/s and m, "=C11/1000" into kN/m from kg/m: the
    // slip engineers make most, a g left out (or one too many), said outright as the notation
    // says it; "momentum" or "linear density" alone does not point at it.
    static void note_gravity_apart(diagnostic& d, const dimension& computed,
                                   const dimension& written) {
        const dimension acceleration = dimension::base(base_dimension::length) /
                                       dimension::base(base_dimension::time).pow(rational(2));
        try {
            if (computed * acceleration == written)
                d.notes.push_back({std::string(g_left_out_advice), {}});
            else if (written * acceleration == computed)
                d.notes.push_back({std::string(g_too_many_advice), {}});
        } catch (const std::exception&) {
            // Exponents past the exact range: no note.
        }
    }

    // "C8", or "Lift!C8" where the cell is on another sheet than the formula's, which has a C8
    // of its own.
    std::string reference_name(const lowered_reference& r, std::size_t formula_sheet) const {
        if (r.sheet == formula_sheet)
            return a1_name(r.area);
        return fmt::format("{}!{}", book_.sheets[r.sheet].name, a1_name(r.area));
    }

    void add_input_notes(diagnostic& d, const formula_cell& f) {
        std::size_t listed = 0;
        std::vector<std::string> seen;
        for (std::uint32_t i = 0; i < f.lowered.reference_count && listed < 6; ++i) {
            const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
            const std::string name = reference_name(r, f.sheet);
            if (std::find(seen.begin(), seen.end(), name) != seen.end())
                continue;
            seen.push_back(name);
            const cell_value v = note_value(r);
            if (!v.dim)
                continue;
            ++listed;
            d.notes.push_back({v.describe_for(name), {}});
        }
    }

    // ---- Inputs without units -------------------------------------------------------------

    // What each formula that uses the input requires of it, solved from its uses.
    struct use_requirement {
        std::uint32_t user;
        input_requirement need;
    };

    std::vector<use_requirement> requirements_for(std::uint64_t key,
                                                  const std::vector<std::uint32_t>& users) {
        const std::size_t s = static_cast<std::size_t>(key >> 45);
        const cell_address a{static_cast<std::uint32_t>((key >> 20) & 0x1FFFFFFULL),
                             static_cast<std::uint32_t>(key & 0xFFFFF)};
        std::vector<use_requirement> out;
        std::vector<input_role> roles;
        for (const std::uint32_t id : users) {
            const formula_cell& f = formulas_[id];
            if (f.lowered.formula == syntax::no_index)
                continue;
            roles.assign(lowered_.tree.references.size(), input_role::other);
            for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
                const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
                if (r.sheet != s || !r.area.contains(a))
                    continue;
                roles[r.reference] =
                    r.area.single() ? input_role::the_input : input_role::range_with_it;
            }
            std::optional<syntax::reference_value> result;
            if (const cell_unit* u = unit_of(f.sheet, f.source->at)) {
                result = syntax::reference_value{};
                result->dim = u->unit.dim;
                result->scale = u->unit.scale;
                result->exact_scale = u->unit.exact_scale;
                result->offset = u->unit.offset;
            }
            const syntax::formula& formula = lowered_.tree.formulas[f.lowered.formula];
            for (const auto& need : requirements_of_input(
                     lowered_.tree, lowered_.tree.sides[formula.first_side].root, roles, result))
                out.push_back({id, need});
        }
        return out;
    }

    // The unit of a cell a user formula refers to that has this dimension and scale, to name
    // the scale by example ("mm, as C4").
    std::optional<std::string> unit_like(const formula_cell& f, const input_requirement& need) {
        for (std::uint32_t i = 0; i < f.lowered.reference_count; ++i) {
            const lowered_reference& r = lowered_.references[f.lowered.first_reference + i];
            if (!r.area.single())
                continue;
            const cell* c = book_.sheets[r.sheet].find(r.area.first);
            if (c == nullptr || c->kind != cell_kind::number)
                continue;
            const cell_unit* u = unit_of(r.sheet, c->at);
            if (u != nullptr && u->unit.dim == need.dim && u->unit.offset == nullptr &&
                std::abs(u->unit.scale / *need.scale - 1.0) <= 1e-9)
                return fmt::format("{}, as {} is", u->unit.text, a1_name(r.area));
        }
        return std::nullopt;
    }

    // "C36 uses it as [L] (length)", or where its uses disagree.
    void say_what_uses_require(diagnostic& d, std::uint64_t key,
                               const std::vector<std::uint32_t>& users) {
        const std::vector<use_requirement> needs = requirements_for(key, users);
        if (needs.empty())
            return;
        const auto differs = std::find_if(needs.begin(), needs.end(), [&](const auto& n) {
            return !(n.need.dim == needs.front().need.dim);
        });
        if (differs != needs.end()) {
            d.message += fmt::format("; its uses disagree about its unit: it is used as {} in {} "
                                     "but as {} in {}",
                                     kind_of(needs.front().need.dim), cell_name(needs.front().user),
                                     kind_of(differs->need.dim), cell_name(differs->user));
            return;
        }
        std::vector<std::string> names;
        for (const auto& n : needs)
            if (std::find(names.begin(), names.end(), cell_name(n.user)) == names.end())
                names.push_back(cell_name(n.user));
        d.message += fmt::format("; it is used as {} in {}", kind_of(needs.front().need.dim),
                                 fmt::join(names, " and "));
        // The scale, when every use fixes the same one.
        const bool one_scale = std::all_of(needs.begin(), needs.end(), [&](const auto& n) {
            return n.need.scale && needs.front().need.scale &&
                   std::abs(*n.need.scale / *needs.front().need.scale - 1.0) <= 1e-9;
        });
        if (!one_scale)
            return;
        if (const auto like = unit_like(formulas_[needs.front().user], needs.front().need))
            d.notes.push_back({fmt::format("for {} to give the unit written for it, the value "
                                           "must be in {}",
                                           cell_name(needs.front().user), *like),
                               {}});
        else if (std::abs(*needs.front().need.scale - 1.0) <= 1e-9)
            d.notes.push_back({fmt::format("for {} to give the unit written for it, the value "
                                           "must be in coherent SI units",
                                           cell_name(needs.front().user)),
                               {}});
    }

    // "the text beside it in D14, 'lb/lbmol', does not read as a unit: unknown unit 'lbmol'":
    // the engineer wrote a unit; say which word of it plumb does not know, and how to define it.
    std::string why_not_a_unit(const unread_unit& unread) const {
        const std::string problem = unit_text_problem(unread.text, units_.measures);
        std::string said =
            fmt::format("the {} in {}, '{}', does not read as a unit",
                        unread.heading ? "unit in its column's heading" : "text beside it",
                        a1_name(unread.written_in->at), unread.text);
        if (problem.empty())
            return said + "; write its unit there (as in m3/s, kPa, -), in the column's heading "
                          "(as in 'Flow [m3/s]'), or in the workbook's sidecar";
        // "unknown unit 'lbmol'; did you mean 'mol'?" reads on as "... (did you mean 'mol'?)".
        std::string reason = problem;
        if (const std::size_t guess = reason.find("; did you mean "); guess != std::string::npos)
            reason = reason.substr(0, guess) + " (" + reason.substr(guess + 2) + ")";
        said += ": " + reason;
        const std::size_t open = problem.find('\'');
        const std::size_t close = open == std::string::npos ? open : problem.find('\'', open + 1);
        if (problem.rfind("unknown unit", 0) == 0 && close != std::string::npos)
            said += fmt::format("; define it in the workbook's sidecar with a line such as "
                                "'measure {} = <size> <known unit>', or write a unit plumb knows",
                                problem.substr(open + 1, close - open - 1));
        return said;
    }

    // How a reading on one temperature scale becomes one on the other: °C and °F need both
    // the 1.8 and the 32; an offset scale and its absolute one, the zero alone, with its sign.
    static std::string temperature_conversion_advice(const unit_definition* computed,
                                                     const unit_definition* written) {
        if (computed != nullptr && written != nullptr)
            return fmt::format("a {} reading on the {} scale is {}: the 32 and the 1.8 go "
                               "together, or write the unit the formula gives",
                               computed->symbol, written->symbol,
                               std::abs(written->factor - 1.0) > 1e-9 ? "(the reading)*1.8 + 32"
                                                                      : "((the reading) - 32)/1.8");
        const unit_definition* scale = computed != nullptr ? computed : written;
        const double zero = scale->offset / scale->factor;
        const std::string absolute = std::abs(scale->factor - 1.0) < 1e-9 ? "K" : "\u00B0R";
        return computed != nullptr
                   ? fmt::format("a {} reading is in {} once {:g} is added, as in (the "
                                 "reading) + {:g}, or "
                                 "write the unit the formula gives",
                                 scale->symbol, absolute, zero, zero)
                   : fmt::format("a reading in {} is on the {} scale once {:g} is subtracted, as "
                                 "in (the reading) - {:g}, or write the unit the formula gives",
                                 absolute, scale->symbol, zero, zero);
    }

    // "tons", "pcf": one short word a unit is one letter from ("ton", "psf"), or whose
    // singular is one, rather than a remark ("OK", "checked", "total").
    bool looks_like_a_unit_word(std::string_view t) const {
        if (t.size() < 2 || t.size() > 6 || !std::all_of(t.begin(), t.end(), [](char c) {
                return std::isalpha(static_cast<unsigned char>(c));
            }))
            return false;
        const std::string lower = lower_ascii(t);
        for (const std::string_view remark :
             {"ok",   "yes", "no",   "na",  "tbc", "tbd", "check", "see",  "note", "total", "input",
              "calc", "ref", "each", "sum", "max", "min", "avg",   "mean", "pass", "fail"})
            if (lower == remark)
                return false;
        if (t.back() == 's' && read_unit_text(t.substr(0, t.size() - 1), units_.measures))
            return true;
        return unit_text_problem(t, units_.measures).find("did you mean") != std::string::npos;
    }

    // A formula cell with a unit beside it that does not read as one: its result is compared
    // with nothing, so say so where the text looks like a unit (it has a unit's operators).
    // At most three words, split at blanks and at '/' and '*', one of which reads as a unit of
    // two letters or more.
    bool spaced_words_hold_a_unit(std::string_view t) const {
        if (t.find(' ') == std::string_view::npos)
            return false;
        std::size_t words = 0;
        bool unit = false;
        for (std::size_t at = 0; at < t.size();) {
            const std::size_t end = std::min(t.find_first_of(" /*", at), t.size());
            const std::string_view word = t.substr(at, end - at);
            if (!word.empty()) {
                ++words;
                // Two letters at least: "see A" is a remark, not amperes.
                unit = unit || (word.size() >= 2 &&
                                std::isalpha(static_cast<unsigned char>(word.front())) != 0 &&
                                read_unit_text(word, units_.measures).has_value());
            }
            at = end + 1;
        }
        return words <= 3 && unit;
    }

    // "Row load [tons]" over =D6/3.517: sheets write "tons" for the ton of refrigeration
    // (12 000 Btu/h, NIST SP 811 (2008), B.8) as often as for the short ton, the ton the
    // unit table holds. The plural is read as the one the formula computes, a power or a
    // mass; any other result, or a sum of cells without a unit, leaves it unread.
    const cell_unit* ton_by_what_is_computed(const formula_cell& f,
                                             const syntax::formula& formula) {
        const std::uint64_t key = book_key(f.sheet, f.source->at);
        const auto unread = unread_.find(key);
        if (unread == unread_.end())
            return nullptr;
        const std::string word = lower_ascii(unread->second.text);
        if (word != "tons")
            return nullptr;
        std::vector<diagnostic> scratch;
        const std::optional<value_type> computed =
            check_sheet_formula(lowered_.tree, formula, no_symbols_, scratch);
        if (!computed || computed->numeric)
            return nullptr;
        const dimension power = dimension::base(base_dimension::mass) *
                                dimension::base(base_dimension::length).pow(rational(2)) /
                                dimension::base(base_dimension::time).pow(rational(3));
        const bool refrigeration = computed->dim == power;
        if (!refrigeration && !(computed->dim == dimension::base(base_dimension::mass)))
            return nullptr;
        auto unit = read_unit_text(refrigeration ? "TR" : "ton", units_.measures);
        if (!unit)
            return nullptr;
        // A cooling tower's ton is 15 000 Btu/h, the heat it rejects for a refrigeration ton
        // with the compressor's work (CTI, from memory): read so where the row or the formula
        // says it ("Heat rejected, tower tons", =C15/15000).
        const auto mentions_tower = [](std::string_view text) {
            const std::string lower = lower_ascii(text);
            return lower.find("tower") != std::string::npos;
        };
        const row_label label = label_of(f.sheet, f.source->at);
        const bool tower =
            refrigeration && (f.source->text.find("15000") != std::string::npos ||
                              mentions_tower(label.description) || mentions_tower(label.name));
        if (tower) {
            unit->scale *= 1.25;
            if (unit->exact_scale)
                unit->exact_scale = *unit->exact_scale * rational(5, 4);
            unit->text = "tower tons";
        }
        const std::string origin =
            fmt::format("'{}' {} {}, read as {} since the cell computes {}", unread->second.text,
                        unread->second.heading ? "from the heading in" : "beside it in",
                        a1_name(unread->second.written_in->at),
                        tower           ? "a cooling tower's tons (15 000 Btu/h)"
                        : refrigeration ? "tons of refrigeration (TR)"
                                        : "short tons",
                        refrigeration ? "a power" : "a mass");
        unread_.erase(unread);
        auto& slot = unit_cache_[key];
        slot = cell_unit{*unit, origin};
        return &*slot;
    }

    void report_unread_unit(const formula_cell& f) {
        const auto text = unread_.find(book_key(f.sheet, f.source->at));
        if (text == unread_.end() || yields_text(f.source->text))
            return;
        const std::string_view t = text->second.text;
        // "kip-ft", "kW(e)": a hyphen or a bracket joins a unit's parts as often as '*'.
        const bool unit_like =
            t.size() <= 40 && t.find(' ') == std::string_view::npos &&
            (t.find_first_of("/*^-(") != std::string_view::npos ||
             t.find("\u00B7") != std::string_view::npos ||
             t.find("\u00B2") != std::string_view::npos ||
             t.find("\u00B3") != std::string_view::npos || looks_like_a_unit_word(t));
        // "US gal", "t CO2/yr", "L/100 km": a few words, one of which is a unit, are a unit
        // written in words plumb does not read, not a remark beside the cell.
        const bool spaced_unit = !unit_like && t.size() <= 40 && spaced_words_hold_a_unit(t);
        // A hyphen joins two units ("acre-ft") whatever the reader made of it.
        const std::string problem = unit_like ? unit_text_problem(t, units_.measures) : "";
        if (!spaced_unit && (!unit_like || (problem.rfind("unknown unit", 0) != 0 &&
                                            t.find('-') == std::string_view::npos)))
            return;
        diagnostic& d = report(severity::warning, rules::no_unit,
                               fmt::format("the unit written {} this cell does not read as "
                                           "a unit, so its result is not compared with one",
                                           text->second.heading ? "over" : "beside"),
                               f.text);
        d.notes.push_back({why_not_a_unit(text->second), {}});
    }

    // "=IF(C32<1,\"subcritical\",\"SUPERCRITICAL\")", "=\"OK\"", "=A1&\" m\"": a formula
    // whose every value is text gives a word, which has no unit to be compared with.
    static bool yields_text(std::string_view formula) {
        if (formula.starts_with('='))
            formula.remove_prefix(1);
        while (!formula.empty() && formula.front() == ' ')
            formula.remove_prefix(1);
        while (!formula.empty() && formula.back() == ' ')
            formula.remove_suffix(1);
        if (formula.empty())
            return false;
        // The top level's arguments and whether a '&' joins texts there.
        std::vector<std::string_view> arguments;
        bool joined = false;
        int depth = 0;
        bool quoted = false;
        std::size_t start = 0;
        const std::size_t open = formula.find('(');
        for (std::size_t i = 0; i < formula.size(); ++i) {
            const char c = formula[i];
            if (c == '"') {
                quoted = !quoted;
            } else if (quoted) {
                continue;
            } else if (c == '(') {
                if (++depth == 1)
                    start = i + 1;
            } else if (c == ')') {
                if (--depth == 0)
                    arguments.push_back(formula.substr(start, i - start));
            } else if (c == ',' && depth == 1) {
                arguments.push_back(formula.substr(start, i - start));
                start = i + 1;
            } else if (c == '&' && depth == 0) {
                joined = true;
            }
        }
        if (joined)
            return true;
        if (formula.front() == '"')
            return formula.size() >= 2 && formula.back() == '"' &&
                   formula.find('"', 1) == formula.size() - 1;
        const std::string name =
            upper_ascii(formula.substr(0, open == std::string_view::npos ? 0 : open));
        if (name != "IF" || arguments.size() != 3 || formula.back() != ')')
            return false;
        return yields_text(arguments[1]) && yields_text(arguments[2]);
    }

    void report_unitless_inputs() {
        if (!unitless_.empty()) {
            std::string text;
            std::vector<cell_place> places;
            std::vector<std::pair<span, std::uint64_t>> lines;
            for (const auto& [key, users] : unitless_) {
                const std::size_t s = static_cast<std::size_t>(key >> 45);
                const cell_address a{static_cast<std::uint32_t>((key >> 20) & 0x1FFFFFFULL),
                                     static_cast<std::uint32_t>(key & 0xFFFFF)};
                const cell* c = book_.sheets[s].find(a);
                const auto begin = static_cast<std::uint32_t>(text.size());
                text += c != nullptr ? c->text : "";
                lines.push_back({{begin, static_cast<std::uint32_t>(text.size())}, key});
                text += '\n';
                places.push_back({book_.sheets[s].name, a1_name(a)});
            }
            report_.sources.push_back(std::make_unique<source_file>(path_, std::move(text)));
            report_.sources.back()->set_cell_places(std::move(places));
            const source_file* values = report_.sources.back().get();
            for (const auto& [where, key] : lines) {
                const auto& users = unitless_.at(key);
                std::vector<std::string> names;
                for (std::size_t i = 0; i < users.size() && i < 5; ++i)
                    names.push_back(cell_name(users[i]));
                if (users.size() > 5)
                    names.push_back(fmt::format("and {} more", users.size() - 5));
                diagnostic d;
                d.level = severity::warning;
                d.rule = std::string(rules::no_unit);
                d.message = fmt::format("this value feeds formulas but has no unit, so they are "
                                        "checked without it: {}",
                                        fmt::join(names, ", "));
                d.where = {values, where};
                say_what_uses_require(d, key, users);
                if (const auto text = unread_.find(key); text != unread_.end())
                    d.notes.push_back({why_not_a_unit(text->second), {}});
                else
                    d.notes.push_back({"write its unit in the cell to its right (as in m3/s, "
                                       "kPa, -), in the column's heading (as in 'Flow [m3/s]'), "
                                       "or in the workbook's sidecar",
                                       {}});
                out_.push_back(std::move(d));
            }
            report_.inputs_without_units += unitless_.size();
        }
        // In cell order: the listing, then the inputs.
        std::stable_sort(out_.begin(), out_.end(), [](const diagnostic& a, const diagnostic& b) {
            if (a.where.file != b.where.file)
                return false;
            return a.where.range.begin < b.where.range.begin;
        });
        for (auto& d : out_)
            report_.diagnostics.push_back(std::move(d));
    }
};

} // namespace

void check_workbook(const workbook& book, const std::string& path, const outside_units& units,
                    check_report& report, bool record_cells) {
    workbook_checker(book, path, units, report, record_cells).run();
}

} // namespace plumb::sheets
