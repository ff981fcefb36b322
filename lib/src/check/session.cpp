// Loads files once each, resolves `use` lines and dictionaries into symbol tables, runs the
// checks, and gathers the findings in file order.
#include "check/acceptance.hpp"
#include "check/edit_distance.hpp"
#include "check/formula_checker.hpp"
#include "check/include_root.hpp"
#include "check/inference.hpp"
#include "check/parallel_check.hpp"
#include "check/path_patterns.hpp"
#include "groups/studies.hpp"
#include "model/ascii_case.hpp"
#include "model/difference_name.hpp"
#include "model/user_file.hpp"
#include "model/utf8.hpp"
#include "notation/markdown.hpp"
#include "notation/parser.hpp"
#include "plumb/accepted.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "sheets/workbook_file.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>
#include <fmt/format.h>
#include <fstream>
#include <limits>
#include <map>
#include <optional>
#include <span>
#include <system_error>
#include <unordered_map>
#include <unordered_set>

namespace plumb {

namespace fs = std::filesystem;

namespace {} // namespace

std::size_t check_report::count(severity level) const {
    return static_cast<std::size_t>(
        std::count_if(diagnostics.begin(), diagnostics.end(),
                      [&](const diagnostic& d) { return d.level == level && !d.accepted; }));
}

std::size_t check_report::count_accepted() const {
    return static_cast<std::size_t>(std::count_if(diagnostics.begin(), diagnostics.end(),
                                                  [](const diagnostic& d) { return d.accepted; }));
}

std::vector<std::string_view> symbol_table::nearest(std::string_view name,
                                                    std::size_t limit) const {
    // Longer names allow more edits ("velocty" for "velocity"). A one- or two-letter name is
    // close to every other short name, so for those only a subscripted form counts ("h" for
    // "h_f").
    const std::size_t max_distance = std::min<std::size_t>(3, name.size() / 3);
    std::vector<std::pair<std::size_t, std::string_view>> scored;
    const bool within_budget =
        suggestion_comparisons_ + names_.size() <= max_suggestion_comparisons;
    if (within_budget)
        suggestion_comparisons_ += names_.size();
    else
        suggestions_cut_short_ = true;
    for (const std::string_view candidate :
         within_budget ? std::span(names_) : std::span<const std::string_view>()) {
        if (candidate.size() > name.size() && candidate.substr(0, name.size()) == name &&
            candidate[name.size()] == '_') {
            scored.emplace_back(candidate.size() - name.size(), candidate);
            continue;
        }
        // A shortened or lengthened subscript: "a_wave" for "a_w", "h_f" for "h_fric".
        const std::size_t underscore = name.find('_');
        if (underscore != std::string_view::npos && candidate.size() > underscore + 1 &&
            candidate.substr(0, underscore + 1) == name.substr(0, underscore + 1)) {
            const std::string_view shorter = candidate.size() < name.size() ? candidate : name;
            const std::string_view longer = candidate.size() < name.size() ? name : candidate;
            if (longer.substr(0, shorter.size()) == shorter) {
                scored.emplace_back(longer.size() - shorter.size(), candidate);
                continue;
            }
        }
        if (max_distance == 0)
            continue;
        const std::size_t d = edit_distance(name, candidate, max_distance);
        if (d <= max_distance)
            scored.emplace_back(d, candidate);
    }
    std::sort(scored.begin(), scored.end());
    // "rho" for "ρ", "mu" for "μ", and the other way round: the ASCII spelling of a Greek
    // letter is the commonest near miss of all.
    static constexpr std::array<std::pair<std::string_view, std::string_view>, 31> greek = {{
        {"alpha", "\u03B1"},   {"beta", "\u03B2"},   {"gamma", "\u03B3"},   {"delta", "\u03B4"},
        {"epsilon", "\u03B5"}, {"zeta", "\u03B6"},   {"eta", "\u03B7"},     {"theta", "\u03B8"},
        {"kappa", "\u03BA"},   {"lambda", "\u03BB"}, {"mu", "\u03BC"},      {"nu", "\u03BD"},
        {"xi", "\u03BE"},      {"rho", "\u03C1"},    {"sigma", "\u03C3"},   {"tau", "\u03C4"},
        {"phi", "\u03C6"},     {"chi", "\u03C7"},    {"psi", "\u03C8"},     {"omega", "\u03C9"},
        {"Gamma", "\u0393"},   {"Delta", "\u0394"},  {"Theta", "\u0398"},   {"Lambda", "\u039B"},
        {"Sigma", "\u03A3"},   {"Phi", "\u03A6"},    {"Psi", "\u03A8"},     {"Omega", "\u03A9"},
        {"upsilon", "\u03C5"}, {"iota", "\u03B9"},   {"omicron", "\u03BF"},
    }};
    const std::size_t stem_end = std::min(name.find('_'), name.size());
    const std::string_view stem = name.substr(0, stem_end);
    const std::string_view rest = name.substr(stem_end);
    for (const auto& [ascii, letter] : greek) {
        std::string other;
        if (stem == ascii)
            other = std::string(letter) + std::string(rest);
        else if (stem == letter)
            other = std::string(ascii) + std::string(rest);
        else
            continue;
        if (const std::string_view* declared = declared_name(other)) {
            const std::string_view found = *declared;
            std::erase_if(scored, [&](const auto& p) { return p.second == found; });
            scored.insert(scored.begin(), {0, found});
        }
    }
    std::vector<std::string_view> out;
    for (std::size_t i = 0; i < scored.size() && i < limit; ++i)
        out.push_back(scored[i].second);
    return out;
}

namespace {

// Two declarations by unit of one dimension whose numbers mean different amounts: kg/m^3 and
// lb/ft^3, or °C and K. A bracket dimension says nothing about scale, so it never differs.
bool differ_in_scale(const symbol_entry& a, const symbol_entry& b) {
    if (a.unit_text.empty() || b.unit_text.empty())
        return false;
    const double relative = std::abs(a.si_factor - b.si_factor) /
                            std::max(std::abs(a.si_factor), std::abs(b.si_factor));
    if (relative > 1e-12)
        return true;
    const double a_zero = a.offset_unit != nullptr ? a.offset_unit->offset : 0.0;
    const double b_zero = b.offset_unit != nullptr ? b.offset_unit->offset : 0.0;
    return a_zero != b_zero;
}

struct loaded_file {
    source_file* source = nullptr;
    std::string key;          // canonical path; empty for text not read from a file
    syntax::parsed_file tree; // declarations and uses; formulas only while deferred
    std::vector<loaded_file*> uses;
    std::vector<diagnostic> diagnostics;
    bool parsed = false;  // tree holds the file's declarations and its parse findings
    bool loading = false; // being parsed now: a `use` of it closes a cycle
};

diagnostic make_diagnostic(severity level, std::string_view rule, std::string message,
                           location where) {
    diagnostic d;
    d.level = level;
    d.rule = std::string(rule);
    d.message = std::move(message);
    d.where = where;
    return d;
}

class session;

// Reads a dictionary: declarations stay in the tree, `use`d files are resolved as met,
// formulas are dropped unchecked.
class dictionary_reader : public statement_sink {
  public:
    dictionary_reader(session& s, loaded_file* f) : session_(s), file_(f) {}
    void on_use(const syntax::parsed_file& tree, const syntax::use_line& use) override;
    void on_declaration(const syntax::parsed_file& /*tree*/, std::uint32_t /*index*/) override {}
    bool on_formula(const syntax::parsed_file& /*tree*/, const syntax::formula& /*f*/) override {
        return true;
    }
    // Units that a --dict dictionary (or the files it uses) defines, as a `use` line would.
    void import_dictionary_units(const loaded_file* dictionary) { import_units(dictionary); }
    [[nodiscard]] const syntax::defined_unit* imported_unit(std::string_view name) const override {
        const auto it = imported_.find(name);
        return it != imported_.end() ? it->second : nullptr;
    }

  protected:
    session& session_;
    loaded_file* file_;
    // By name; the first file to define a name keeps it.
    std::unordered_map<std::string_view, const syntax::defined_unit*> imported_;

    // The units a used file defines, and those of the files it uses in turn.
    void import_units(const loaded_file* used) {
        std::vector<const loaded_file*> pending{used};
        std::vector<const loaded_file*> seen;
        while (!pending.empty()) {
            const loaded_file* f = pending.back();
            pending.pop_back();
            if (std::find(seen.begin(), seen.end(), f) != seen.end())
                continue;
            seen.push_back(f);
            for (const auto& u : f->tree.units)
                imported_.emplace(u.name, &u);
            pending.insert(pending.end(), f->uses.begin(), f->uses.end());
        }
    }
};

// Reads a file being checked: symbols enter the table as they are declared, and each
// formula is checked as soon as it is parsed (or kept for the end when it names a symbol
// declared further down).
class checking_reader : public dictionary_reader {
  public:
    checking_reader(session& s, loaded_file* f, symbol_table& table,
                    std::unordered_set<const loaded_file*>& visited)
        : dictionary_reader(s, f), table_(table), visited_(visited) {}
    void on_use(const syntax::parsed_file& tree, const syntax::use_line& use) override;
    void on_declaration(const syntax::parsed_file& tree, std::uint32_t index) override;
    bool on_formula(const syntax::parsed_file& tree, const syntax::formula& f) override;

    std::size_t formulas = 0;
    std::size_t kept_for_inference = 0;
    std::vector<bool> checked_already; // for each formula left in the tree
    bool infers_symbols = false;       // a "X : ?" declaration has been read

  private:
    symbol_table& table_;
    std::unordered_set<const loaded_file*>& visited_;
    std::optional<formula_checker> checker_; // of the tree being read, made at its first formula

    // Out of line: once per file, and inlined it made every formula save registers for it.
    [[gnu::noinline, gnu::cold]] void start_checker(const syntax::parsed_file& tree) {
        checker_.emplace(tree, table_, file_->diagnostics);
    }
};

class session {
  public:
    session(check_report& report, const check_options& options)
        : report_(report), record_formulas_(options.record_formulas),
          record_side_dimensions_(options.record_formulas && options.record_side_dimensions),
          include_root_(options.include_root) {
        read_restate_units(options.restate_in);
        for (const auto& path : options.dictionaries)
            if (loaded_file* f = load(path, {}))
                dictionaries_.push_back(as_dictionary(f));
        general_from_dictionaries_ = general_.size();
    }

    // Reads a file once; its text is parsed on demand (as a dictionary or when checked).
    loaded_file* load(const fs::path& path, location requested_at) {
        std::error_code ec;
        fs::path key = fs::weakly_canonical(path, ec);
        if (ec)
            key = path;
        if (auto it = by_path_.find(key.string()); it != by_path_.end())
            return it->second;

        std::string text;
        if (!read_file(path, text, requested_at))
            return nullptr;
        if (path.extension() == ".md")
            text = plumb_blocks_of(text); // lines and columns stay those of the notes
        return add(key.string(), path.string(), std::move(text));
    }

    // Bytes that are not UTF-8 (a file saved as Latin-1, a damaged file) are one finding, at
    // the first of them; the rest of the file is still checked, and the renderers show such
    // bytes as U+FFFD.
    void report_invalid_utf8(loaded_file* f) {
        const std::string_view text = f->source->text();
        const auto bad = first_invalid_utf8(text);
        if (!bad)
            return;
        const auto at = static_cast<std::uint32_t>(*bad);
        f->diagnostics.push_back(make_diagnostic(
            severity::error, rules::syntax,
            fmt::format("this file is not valid UTF-8: the bytes {} here are not a character; "
                        "save the file as UTF-8",
                        invalid_bytes_text(text, *bad)),
            {f->source, {at, at + 1}}));
        report_.input_failed = true;
    }

    loaded_file* add(const std::string& key, std::string display_path, std::string text) {
        report_.sources.push_back(
            std::make_unique<source_file>(std::move(display_path), std::move(text)));
        auto owned = std::make_unique<loaded_file>();
        loaded_file* f = owned.get();
        files_.push_back(std::move(owned));
        if (!key.empty())
            by_path_.emplace(key, f);
        f->source = report_.sources.back().get();
        f->key = key;
        report_invalid_utf8(f);
        return f;
    }

    // Parses a file for its declarations (its formulas are not needed) and resolves its uses.
    loaded_file* as_dictionary(loaded_file* f) {
        if (f->parsed || f->loading)
            return f;
        f->loading = true;
        dictionary_reader reader(*this, f);
        take_parse(f, parse_file(*f->source, &reader));
        f->loading = false;
        return f;
    }

    void check(loaded_file* f) {
        symbol_table table;
        std::unordered_set<const loaded_file*> visited;
        for (loaded_file* d : dictionaries_)
            declare_from(d, table, visited, false);
        visited.insert(f); // a dictionary that uses the checked file back adds nothing new

        f->loading = true;
        checking_reader reader(*this, f, table, visited);
        const std::size_t first_result = report_.formulas.size();
        for (const loaded_file* d : dictionaries_)
            reader.import_dictionary_units(d);
        // A "X : ?" may come after the formulas that fix it; a file with any '?' keeps its
        // formulas for inference (a cheap scan, and rare outside such files).
        reader.infers_symbols = f->source->text().find('?') != std::string_view::npos;
        syntax::parsed_file tree = parse_file(*f->source, &reader);
        f->loading = false;
        // Formulas that named a symbol declared further down are checked now, against all.
        formula_checker checker(tree, table, f->diagnostics);
        for (std::size_t i = 0; i < tree.formulas.size(); ++i)
            if (i >= reader.checked_already.size() || !reader.checked_already[i]) {
                checker.check(tree.formulas[i], false);
                record(tree, tree.formulas[i], table);
            }
        if (reader.infers_symbols || reader.kept_for_inference > 0)
            infer_dimensions(tree, tree.formulas, table, f->diagnostics,
                             restate_in_ ? &*restate_in_ : nullptr);
        work_out_studies(tree, table, f->diagnostics, report_.studies);
        sheets::report_cells_outside_sidecar(tree, f->diagnostics);
        const std::size_t formulas = reader.formulas + tree.studies.size();
        if (f->parsed)
            tree.diagnostics.clear(); // reported when the file was read as a dictionary
        else
            take_parse(f, std::move(tree));
        if (formulas > 0)
            report_unused(f, table);
        if (record_formulas_)
            grade_formulas(f, first_result);
        ++report_.files_checked;
        report_.checked_files.push_back(f->source);
        report_.formulas_checked += formulas;
        report_.bytes_checked += f->source->text().size();
    }

    std::optional<dimension> query(std::string expression, const std::vector<fs::path>& context) {
        symbol_table table;
        std::unordered_set<const loaded_file*> visited;
        for (loaded_file* d : dictionaries_)
            declare_from(d, table, visited, false);
        for (const auto& path : context)
            if (loaded_file* f = load(path, {}))
                declare_from(as_dictionary(f), table, visited, false);
        report_.sources.push_back(std::make_unique<source_file>("<query>", std::move(expression)));
        const source_file& src = *report_.sources.back();
        syntax::parsed_file tree = parse_expression(src);
        query_diagnostics_ = std::move(tree.diagnostics);
        if (const auto bad = first_invalid_utf8(src.text())) {
            const auto at = static_cast<std::uint32_t>(*bad);
            query_diagnostics_.push_back(
                make_diagnostic(severity::error, rules::syntax,
                                fmt::format("the bytes {} here are not UTF-8",
                                            invalid_bytes_text(src.text(), *bad)),
                                {&src, {at, at + 1}}));
            report_.input_failed = true;
            return std::nullopt;
        }
        if (tree.has_syntax_error)
            report_.input_failed = true;
        if (tree.sides.empty() && !tree.has_syntax_error) {
            query_diagnostics_.push_back(make_diagnostic(
                severity::error, rules::syntax,
                "there is no expression here to work out ('#' starts a comment)", {}));
            report_.input_failed = true;
        }
        if (tree.sides.empty() || tree.has_syntax_error)
            return std::nullopt;
        return expression_dimension(tree, tree.sides.front().root, table, query_diagnostics_);
    }

    // Findings in the order files were first read, each file's sorted by position, with
    // repeats (a conflict between two dictionaries seen from several files) dropped.
    void finish() {
        auto& out = report_.diagnostics;
        out.insert(out.end(), std::make_move_iterator(general_.begin()),
                   std::make_move_iterator(general_.end()));
        for (auto& f : files_) {
            auto& ds = f->diagnostics;
            std::stable_sort(ds.begin(), ds.end(), [](const diagnostic& a, const diagnostic& b) {
                return a.where.range.begin < b.where.range.begin;
            });
            for (auto& d : ds) {
                const bool repeated =
                    std::any_of(out.end() - std::min<std::ptrdiff_t>(
                                                static_cast<std::ptrdiff_t>(out.size()), 8),
                                out.end(), [&](const diagnostic& e) {
                                    return e.where.file == d.where.file &&
                                           e.where.range.begin == d.where.range.begin &&
                                           e.rule == d.rule && e.message == d.message;
                                });
                if (!repeated)
                    out.push_back(std::move(d));
            }
            ds.clear();
        }
        out.insert(out.end(), std::make_move_iterator(query_diagnostics_.begin()),
                   std::make_move_iterator(query_diagnostics_.end()));
    }

    // The findings left grouped by file, for merging with other sessions' (see
    // parallel_check.hpp) rather than put in order by finish().
    detail::session_findings take_grouped() {
        detail::session_findings out;
        const auto split =
            general_.begin() + static_cast<std::ptrdiff_t>(general_from_dictionaries_);
        out.reading_dictionaries.assign(std::make_move_iterator(general_.begin()),
                                        std::make_move_iterator(split));
        out.about_run.assign(std::make_move_iterator(split),
                             std::make_move_iterator(general_.end()));
        general_.clear();
        for (auto& f : files_)
            out.files.push_back({f->source, f->key, std::move(f->diagnostics)});
        return out;
    }

    void fail(std::string message) {
        general_.push_back(
            make_diagnostic(severity::error, rules::unreadable, std::move(message), {}));
        report_.input_failed = true;
    }

    // The sign-off report lists every formula with the dimension of each side. The test is
    // apart from the work so that it is inlined where every formula passes (issue 12).
    void record(const syntax::parsed_file& tree, const syntax::formula& f, symbol_table& table) {
        if (record_formulas_)
            record_formula(tree, f, table);
    }
    [[gnu::noinline]] void record_formula(const syntax::parsed_file& tree, const syntax::formula& f,
                                          symbol_table& table) {
        formula_record r;
        r.where = {tree.source, f.range};
        r.label = std::string(tree.source->text(f.label));
        if (record_side_dimensions_) {
            std::vector<diagnostic> already_reported;
            for (std::uint32_t i = 0; i < f.side_count; ++i) {
                const syntax::formula_side& side = tree.sides[f.first_side + i];
                if (i > 0)
                    r.relations.emplace_back(relation_text(side.relation_before));
                r.sides.push_back(expression_dimension(tree, side.root, table, already_reported));
            }
        }
        auto& all = report_.formulas;
        // Formulas checked at the end of their file go back into file order.
        auto at = all.end();
        while (at != all.begin() && (at - 1)->where.file == r.where.file &&
               (at - 1)->where.range.begin > r.where.range.begin)
            --at;
        all.insert(at, std::move(r));
    }

  private:
    check_report& report_;
    bool record_formulas_ = false;
    bool record_side_dimensions_ = false;
    std::optional<coherent_units> restate_in_;

    static std::string_view relation_text(syntax::relation_kind k) {
        switch (k) {
        case syntax::relation_kind::less:
            return "<";
        case syntax::relation_kind::less_equal:
            return "<=";
        case syntax::relation_kind::greater:
            return ">";
        case syntax::relation_kind::greater_equal:
            return ">=";
        default:
            return "=";
        }
    }

    // "ft", "lb", "s": each must be a unit of exactly one base dimension.
    void read_restate_units(const std::vector<std::string>& symbols) {
        if (symbols.empty())
            return;
        std::string why; // the command line reports it (restate_units_problem)
        restate_in_ = coherent_units_from(symbols, why);
    }

    // Each recorded formula of `f` takes the most severe finding that starts inside it.
    void grade_formulas(const loaded_file* f, std::size_t first) {
        std::vector<std::pair<std::uint32_t, severity>> starts;
        for (const diagnostic& d : f->diagnostics)
            if (d.where.file == f->source)
                starts.emplace_back(d.where.range.begin, d.level);
        std::sort(starts.begin(), starts.end());
        for (std::size_t i = first; i < report_.formulas.size(); ++i) {
            formula_record& r = report_.formulas[i];
            auto it = std::lower_bound(starts.begin(), starts.end(),
                                       std::pair{r.where.range.begin, severity::note});
            for (; it != starts.end() && it->first < r.where.range.end; ++it)
                if (!r.worst || *r.worst < it->second)
                    r.worst = it->second;
        }
    }

    std::vector<loaded_file*> dictionaries_;
    std::vector<std::unique_ptr<loaded_file>> files_;
    std::map<std::string, loaded_file*> by_path_;
    std::vector<diagnostic> general_;
    std::size_t general_from_dictionaries_ = 0; // of general_, those from reading --dict files
    std::vector<diagnostic> query_diagnostics_;
    fs::path include_root_; // empty: `use` may name any file

    bool read_file(const fs::path& path, std::string& text, location requested_at) {
        user_file read = read_user_file(path);
        if (read.problem.empty()) {
            text = std::move(read.text);
            return true;
        }
        const std::string& why = read.problem;
        const std::string message = fmt::format("cannot read '{}': {}", path.string(), why);
        if (requested_at.file == nullptr) {
            fail(message);
        } else {
            // Report it in the file that asked for it, once.
            for (auto& f : files_)
                if (f->source == requested_at.file)
                    f->diagnostics.push_back(
                        make_diagnostic(severity::error, rules::unreadable, message, requested_at));
            report_.input_failed = true;
        }
        return false;
    }

    friend class dictionary_reader;
    friend class checking_reader;

    void take_parse(loaded_file* f, syntax::parsed_file tree) {
        if (tree.has_syntax_error)
            report_.input_failed = true;
        for (auto& d : tree.diagnostics)
            f->diagnostics.push_back(std::move(d));
        tree.diagnostics.clear();
        tree.nodes = {};
        tree.call_args = {};
        tree.quantities = {};
        tree.sides = {};
        tree.formulas = {};
        f->tree = std::move(tree);
        f->parsed = true;
    }

    // The file a `use` line names, read as a dictionary; null (and reported) when it cannot be.
    loaded_file* resolve_use(loaded_file* f, const syntax::use_line& use) {
        const location at{f->source, use.range};
        const fs::path base = fs::path(f->source->path()).parent_path();
        fs::path target = base / std::string(f->source->text(use.path));
        if (!include_root_.empty()) {
            const auto inside = path_inside_root(include_root_, base, f->source->text(use.path));
            if (!inside) {
                f->diagnostics.push_back(make_diagnostic(
                    severity::error, rules::unreadable,
                    fmt::format("'{}' lies outside the include folder '{}', which `use` may "
                                "not leave; nothing was read",
                                f->source->text(use.path), include_root_.string()),
                    at));
                report_.input_failed = true;
                return nullptr;
            }
            target = *inside;
        }
        loaded_file* used = load(target, at);
        if (used == nullptr)
            return nullptr;
        if (used->loading) {
            f->diagnostics.push_back(make_diagnostic(
                severity::error, rules::include_cycle,
                fmt::format("'{}' uses this file in turn, so they form a cycle; move the shared "
                            "declarations into a dictionary that uses neither",
                            f->source->text(use.path)),
                at));
            return nullptr;
        }
        as_dictionary(used);
        f->uses.push_back(used);
        return used;
    }

    void declare_from(loaded_file* f, symbol_table& table,
                      std::unordered_set<const loaded_file*>& visited, bool local) {
        if (!visited.insert(f).second)
            return;
        for (loaded_file* u : f->uses)
            declare_from(u, table, visited, local);
        declare(f, table, local);
    }

    void declare(loaded_file* f, symbol_table& table, bool local) {
        declare_names(f, f->tree, 0, static_cast<std::uint32_t>(f->tree.names.size()), table,
                      local);
    }

    // "p_tk : inH2O "tank vapour space on the tank gauge"": inches of water that a gauge reads
    // are a gauge reading, as a tank's, a draft's and a gas supply's are (common practice);
    // the declaration says so in its words where it does not in its unit (inH2Og).
    static const unit_definition* water_gauge_reading(std::string_view name,
                                                      const syntax::declaration& decl,
                                                      const symbol_entry& entry) {
        if (decl.kind.single_unit == nullptr || decl.kind.single_unit->symbol != "inH2O" ||
            entry.unit_text != "inH2O" || names_a_difference(name, entry.description))
            return nullptr;
        if (!describes_a_gauge_reading(entry.description))
            return nullptr;
        const auto unit = unit_table::standard().resolve("inH2Og");
        return unit ? unit->unit : nullptr;
    }

    void declare_names(loaded_file* f, const syntax::parsed_file& tree, std::uint32_t first,
                       std::uint32_t count, symbol_table& table, bool local) {
        for (std::uint32_t i = first; i < first + count; ++i) {
            const syntax::declared_name& n = tree.names[i];
            const std::string_view name = f->source->text(n.name);
            const location at{f->source, n.name};
            if (name == "pi" || name == "\u03C0") {
                f->diagnostics.push_back(make_diagnostic(
                    severity::error, rules::reserved_name,
                    fmt::format("'{}' is the number \u03C0 and cannot be declared; choose another "
                                "name",
                                name),
                    at));
                continue;
            }
            const syntax::declaration& decl = tree.declarations[n.declaration];
            symbol_entry entry;
            entry.dim = decl.kind.dim;
            entry.declared_at = at;
            entry.description = f->source->text(decl.description);
            entry.local = local;
            entry.to_infer = decl.kind.to_infer;
            if (decl.kind.by_unit) {
                entry.unit_text = f->source->text(decl.spec);
                entry.si_factor = decl.kind.si_factor;
                entry.si_exact = decl.kind.si_exact;
                if (decl.kind.single_unit != nullptr &&
                    decl.kind.single_unit->scale != unit_scale::absolute)
                    entry.offset_unit = decl.kind.single_unit;
                else if (const unit_definition* gauge = water_gauge_reading(name, decl, entry))
                    entry.offset_unit = gauge;
            }
            auto [existing, inserted] = table.insert(name, entry);
            if (inserted) {
                if (!entry.unit_text.empty())
                    table.note_unit_marks(unit_marks_of(entry.unit_text));
                if (entry.offset_unit != nullptr)
                    table.note_unit_marks(offset_scale_readings);
                if (entry.description.find("auge") != std::string_view::npos ||
                    counts_below_the_barometer(name, entry.description))
                    table.note_unit_marks(read_from_barometer);
                continue;
            }
            if (existing->declared_at.file == at.file &&
                existing->declared_at.range.begin == at.range.begin)
                continue;
            if (existing->dim && entry.dim && !(*existing->dim == *entry.dim)) {
                diagnostic d = make_diagnostic(
                    severity::error, rules::conflicting_declaration,
                    fmt::format("'{}' is declared again with a different dimension: {} here, {} "
                                "before",
                                name, entry.dim->to_string(), existing->dim->to_string()),
                    at);
                d.terms.push_back({at, std::string(name), *entry.dim});
                d.terms.push_back({existing->declared_at, std::string(name), *existing->dim});
                d.notes.push_back({fmt::format("'{}' is first declared here, as {}", name,
                                               existing->dim->to_string()),
                                   existing->declared_at});
                f->diagnostics.push_back(std::move(d));
                continue;
            }
            if (existing->dim && entry.dim && differ_in_scale(*existing, entry)) {
                const auto unit_of = [](const symbol_entry& e) {
                    return fmt::format("{} (1 {} = {:.7g} in SI units{})", e.unit_text, e.unit_text,
                                       e.si_factor,
                                       e.offset_unit != nullptr ? ", with a zero of its own" : "");
                };
                diagnostic d = make_diagnostic(
                    severity::error, rules::conflicting_declaration,
                    fmt::format("'{}' is declared again in a unit of another scale: {} here, {} "
                                "before; the numbers put in for it would be read two ways",
                                name, entry.unit_text, existing->unit_text),
                    at);
                d.terms.push_back({at, std::string(name), *entry.dim});
                d.terms.push_back({existing->declared_at, std::string(name), *existing->dim});
                d.notes.push_back(
                    {fmt::format("'{}' is first declared here, in {}", name, unit_of(*existing)),
                     existing->declared_at});
                d.notes.push_back({fmt::format("here it is in {}; declare it once, or give the "
                                               "two quantities different names",
                                               unit_of(entry)),
                                   {}});
                f->diagnostics.push_back(std::move(d));
                continue;
            }
            if (local && !existing->local) {
                // The file declares it itself; it answers for it being used.
                existing->local = true;
                existing->declared_at = at;
                if (!entry.description.empty())
                    existing->description = entry.description;
            }
        }
    }

    void report_unused(loaded_file* f, symbol_table& table) {
        for (const auto& n : f->tree.names) {
            const std::string_view name = f->source->text(n.name);
            const symbol_entry* e = table.find(name);
            // A "X : ?" symbol that nothing uses is reported by inference, once.
            if (e == nullptr || e->used || !e->local || e->to_infer ||
                e->declared_at.file != f->source || e->declared_at.range.begin != n.name.begin)
                continue;
            diagnostic d = make_diagnostic(severity::warning, rules::unused,
                                           fmt::format("'{}' is declared but never used", name),
                                           {f->source, n.name});
            d.notes.push_back(
                {"remove the declaration, or check the formula that should use it", {}});
            f->diagnostics.push_back(std::move(d));
        }
    }
};

void dictionary_reader::on_use(const syntax::parsed_file& /*tree*/, const syntax::use_line& use) {
    if (const loaded_file* used = session_.resolve_use(file_, use))
        import_units(used);
}

void checking_reader::on_use(const syntax::parsed_file& /*tree*/, const syntax::use_line& use) {
    if (loaded_file* used = session_.resolve_use(file_, use)) {
        import_units(used);
        session_.declare_from(used, table_, visited_, false);
    }
}

void checking_reader::on_declaration(const syntax::parsed_file& tree, std::uint32_t index) {
    const syntax::declaration& d = tree.declarations[index];
    if (d.kind.to_infer)
        infers_symbols = true;
    session_.declare_names(file_, tree, d.first_name, d.name_count, table_, true);
}

bool checking_reader::on_formula(const syntax::parsed_file& tree, const syntax::formula& f) {
    ++formulas;
    if (!checker_ || &checker_->file() != &tree) [[unlikely]]
        start_checker(tree);
    const bool checked = checker_->check(f, true);
    if (checked)
        session_.record(tree, f, table_);
    // Formulas that inference needs stay in the tree until the end of the file, as do those
    // that name a symbol declared further down (checked then).
    const bool keep = !checked || f.has_inferred || infers_symbols;
    if (keep)
        checked_already.push_back(checked);
    if (checked && keep)
        ++kept_for_inference;
    return !keep;
}

// A Markdown file is a calc note when it holds a plumb block.
bool is_calc_note(const fs::path& path) {
    // A note too large or unreadable is taken as a calc note, so that checking it says why.
    const user_file read = read_user_file(path);
    return !read.problem.empty() || has_plumb_blocks(read.text);
}

diagnostic run_failure(std::string message) {
    return make_diagnostic(severity::error, rules::unreadable, std::move(message), {});
}

void collect_plumb_files(const fs::path& dir, std::vector<fs::path>& out,
                         std::vector<diagnostic>& failures) {
    std::error_code ec;
    std::vector<fs::path> found;
    fs::recursive_directory_iterator it(dir, fs::directory_options::skip_permission_denied, ec);
    if (ec) {
        failures.push_back(
            run_failure(fmt::format("cannot read folder '{}': {}", dir.string(), ec.message())));
        return;
    }
    for (; it != fs::recursive_directory_iterator(); it.increment(ec)) {
        if (ec) {
            failures.push_back(run_failure(
                fmt::format("cannot read folder '{}': {}", dir.string(), ec.message())));
            break;
        }
        std::error_code type_ec;
        // A workbook's sidecar is read with its workbook, never checked on its own.
        if (!it->is_regular_file(type_ec))
            continue;
        if ((it->path().extension() == ".plumb" && !sheets::is_sidecar_path(it->path())) ||
            (it->path().extension() == ".md" && is_calc_note(it->path())) ||
            sheets::is_workbook_path(it->path()))
            found.push_back(it->path());
    }
    std::sort(found.begin(), found.end());
    out.insert(out.end(), found.begin(), found.end());
}

} // namespace

namespace detail {

session_findings check_in_one_session(const std::vector<fs::path>& files,
                                      const check_options& options, check_report& report) {
    session s(report, options);
    // A file named twice (or inside two folders given) is checked once.
    std::unordered_set<const loaded_file*> checked;
    for (const auto& p : files)
        if (loaded_file* f = s.load(p, {}); f != nullptr && checked.insert(f).second)
            s.check(f);
    return s.take_grouped();
}

} // namespace detail

check_report check_paths(const std::vector<fs::path>& paths, const check_options& options) {
    check_report report;
    std::vector<diagnostic> listing_failures;
    std::vector<fs::path> files;
    for (const auto& p : paths) {
        std::error_code ec;
        if (!fs::is_directory(p, ec)) {
            files.push_back(p);
            continue;
        }
        const std::size_t before = files.size();
        collect_plumb_files(p, files, listing_failures);
        // A hook run on an empty or mistyped folder must not pass for a clean check.
        if (files.size() == before)
            listing_failures.push_back(run_failure(fmt::format(
                "nothing to check in '{}': no .plumb files in it or below", p.string())));
    }
    if (!options.exclude.empty())
        std::erase_if(files, [&](const fs::path& p) {
            const std::string relative = project_relative(p, options.project_root);
            return std::any_of(
                options.exclude.begin(), options.exclude.end(),
                [&](const std::string& pattern) { return path_matches(pattern, relative); });
        });
    // A file named twice (or inside two folders given) is checked once: sessions on other
    // threads could not tell.
    std::vector<fs::path> notation_files;
    std::vector<fs::path> workbooks;
    std::unordered_set<std::string> listed;
    for (const auto& p : files) {
        std::error_code ec;
        fs::path key = fs::weakly_canonical(p, ec);
        if (ec)
            key = p;
        if (listed.insert(key.string()).second)
            (sheets::is_workbook_path(p) ? workbooks : notation_files).push_back(p);
    }
    detail::check_listed_files(notation_files, workbooks, std::move(listing_failures), options,
                               report);
    review_findings(report, options);
    return report;
}

check_report check_text(std::string name, std::string text, const check_options& options) {
    check_report report;
    session s(report, options);
    s.check(s.add("", std::move(name), std::move(text)));
    s.finish();
    review_findings(report, options);
    return report;
}

query_result query_dimension(std::string expression, const std::vector<fs::path>& context_files,
                             const check_options& options) {
    query_result result;
    session s(result.report, options);
    result.dim = s.query(std::move(expression), context_files);
    s.finish();
    return result;
}

} // namespace plumb
