// PEGTL actions for the A1 grammar that build the checker's syntax tree directly. As in the
// notation's parser, actions fire only when their rule succeeds and every choice point either
// commits (must<>) or fails before an action ran, so the operand stack stays consistent.
#include "sheets/a1_front_end.hpp"

#include "model/ascii_case.hpp"
#include "model/node_stack.hpp"

#include "plumb/a1_formula.hpp"
#include "plumb/a1_formula_errors.hpp"

#include <algorithm>
#include <cctype>
#include <fmt/format.h>

namespace plumb::sheets {

namespace {

namespace pg = tao::pegtl;
namespace g = plumb::a1;
using syntax::expr_kind;

struct formula_syntax_error {
    const char* message;
    const char* at;
};

constexpr int max_nesting = 256;

struct lowering {
    lowered_book& book;
    const workbook& wb;
    std::size_t sheet;
    const char* text_begin; // the listing's first byte: spans are offsets from it
    span hundred;
    syntax::node_stack stack;
    std::vector<std::uint32_t> argument_counts;
    std::string not_checked;
    int depth = 0;

    syntax::parsed_file& out() { return book.tree; }

    template <typename Input> span range(const Input& in) const {
        return {static_cast<std::uint32_t>(in.begin() - text_begin),
                static_cast<std::uint32_t>(in.end() - text_begin)};
    }
    std::uint32_t push_node(syntax::expr_node n) { return stack.push(out(), n); }
    std::uint32_t pop() { return stack.pop(); }
    void push_binary(expr_kind kind) { stack.push_binary(out(), kind); }
    // A value the checker cannot type (text, TRUE, an error value): unknown, so not checked.
    std::uint32_t push_opaque(span where) {
        out().references.emplace_back();
        return push_node(
            {expr_kind::reference, where, static_cast<std::uint32_t>(out().references.size() - 1)});
    }
    std::uint32_t push_reference(span where, std::size_t sheet_index, const cell_area& area) {
        out().references.emplace_back();
        const auto index = static_cast<std::uint32_t>(out().references.size() - 1);
        book.references.push_back({index, sheet_index, area, where});
        return push_node({expr_kind::reference, where, index});
    }
};

template <typename Rule> struct control : pg::normal<Rule> {
    static constexpr bool nests = std::is_same_v<Rule, g::prefixed>;

    template <typename Input> static void start(const Input& in, lowering& s) {
        if constexpr (nests) {
            if (++s.depth > max_nesting)
                throw formula_syntax_error{"this formula nests too deeply to check", in.current()};
        }
    }
    template <typename Input> static void success(const Input& /*in*/, lowering& s) {
        if constexpr (nests)
            --s.depth;
    }
    template <typename Input> static void failure(const Input& /*in*/, lowering& s) {
        if constexpr (nests)
            --s.depth;
    }
    template <typename Input, typename... States>
    [[noreturn]] static void raise(const Input& in, States&&... /*unused*/) {
        constexpr const char* own = g::error_message<Rule>;
        throw formula_syntax_error{own != nullptr ? own : "unexpected text here", in.current()};
    }
};

std::optional<cell_area> parse_area(std::string_view t) {
    const std::size_t colon = t.find(':');
    if (colon == std::string_view::npos) {
        const auto a = parse_a1(t);
        if (!a)
            return std::nullopt;
        return cell_area{*a, *a};
    }
    const auto a = parse_a1(t.substr(0, colon));
    const auto b = parse_a1(t.substr(colon + 1));
    if (a && b)
        return cell_area{{std::min(a->row, b->row), std::min(a->column, b->column)},
                         {std::max(a->row, b->row), std::max(a->column, b->column)}};
    // Whole columns: "A:C", "$A:$A".
    const auto column_of = [](std::string_view c) {
        return parse_a1(std::string(c.substr(c.front() == '$' ? 1 : 0)) + "1");
    };
    const auto ca = column_of(t.substr(0, colon));
    const auto cb = column_of(t.substr(colon + 1));
    if (!ca || !cb)
        return std::nullopt;
    return cell_area{{0, std::min(ca->column, cb->column)},
                     {max_rows - 1, std::max(ca->column, cb->column)}};
}

template <typename Rule> struct action : pg::nothing<Rule> {};

template <> struct action<g::number> {
    template <typename In> static void apply(const In& in, lowering& s) {
        s.push_node({expr_kind::number, s.range(in)});
    }
};
template <typename Rule> struct opaque_action {
    template <typename In> static void apply(const In& in, lowering& s) {
        s.push_opaque(s.range(in));
    }
};
template <> struct action<g::string_literal> : opaque_action<g::string_literal> {};
template <> struct action<g::error_literal> : opaque_action<g::error_literal> {};
template <> struct action<g::array_constant> : opaque_action<g::array_constant> {};
template <> struct action<g::boolean> : opaque_action<g::boolean> {};
template <> struct action<g::empty_argument> : opaque_action<g::empty_argument> {};

template <> struct action<g::reference> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const auto resolved = resolve_reference(s.wb, s.sheet, in.string_view());
        if (!resolved) {
            s.not_checked =
                fmt::format("'{}' names a sheet the workbook does not have", in.string_view());
            s.push_opaque(s.range(in));
            return;
        }
        s.push_reference(s.range(in), resolved->first, resolved->second);
    }
};
template <> struct action<g::defined_name> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const std::string name = upper_ascii(in.string_view());
        const defined_name* found = nullptr;
        for (const auto& d : s.wb.names)
            if (upper_ascii(d.name) == name && (found == nullptr || d.sheet == s.sheet))
                if (!d.sheet || *d.sheet == s.sheet)
                    found = &d;
        if (found != nullptr)
            if (const auto r = resolve_reference(s.wb, s.sheet, found->refers_to)) {
                s.push_reference(s.range(in), r->first, r->second);
                return;
            }
        s.not_checked =
            fmt::format("'{}' is not a name of a cell or range in this workbook", in.string_view());
        s.push_opaque(s.range(in));
    }
};
template <> struct action<g::function_name> {
    template <typename In> static void apply(const In& in, lowering& s) {
        s.push_node({expr_kind::call, s.range(in)});
    }
};
template <> struct action<g::call_open> {
    template <typename In> static void apply(const In& /*in*/, lowering& s) {
        s.argument_counts.push_back(0);
    }
};
template <> struct action<g::argument> {
    template <typename In> static void apply(const In& /*in*/, lowering& s) {
        ++s.argument_counts.back();
    }
};

// VLOOKUP's and HLOOKUP's table, INDEX's range: the column (or row) that gives the result.
std::optional<cell_area> nth_line(const cell_area& a, std::int64_t n, bool rows) {
    if (n < 1)
        return std::nullopt;
    cell_area r = a;
    if (rows) {
        if (a.first.row + static_cast<std::uint64_t>(n - 1) > a.last.row)
            return std::nullopt;
        r.first.row = r.last.row = a.first.row + static_cast<std::uint32_t>(n - 1);
    } else {
        if (a.first.column + static_cast<std::uint64_t>(n - 1) > a.last.column)
            return std::nullopt;
        r.first.column = r.last.column = a.first.column + static_cast<std::uint32_t>(n - 1);
    }
    return r;
}

template <> struct action<g::call_arguments> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const std::uint32_t count = s.argument_counts.back();
        s.argument_counts.pop_back();
        std::vector<std::uint32_t> args(s.stack.operands.end() - count, s.stack.operands.end());
        s.stack.operands.resize(s.stack.operands.size() - count);
        const std::uint32_t call_index = s.stack.operands.back();
        auto& out = s.out();
        const std::string name = upper_ascii(
            std::string_view(s.text_begin + out.nodes[call_index].range.begin,
                             out.nodes[call_index].range.end - out.nodes[call_index].range.begin));
        out.nodes[call_index].range.end = s.range(in).end;
        if (name == "PI" && count == 0) {
            out.nodes[call_index].kind = expr_kind::pi;
            return;
        }
        const auto reference_of = [&](std::uint32_t node) -> const lowered_reference* {
            if (out.nodes[node].kind != expr_kind::reference)
                return nullptr;
            for (auto it = s.book.references.rbegin(); it != s.book.references.rend(); ++it)
                if (it->reference == out.nodes[node].lhs)
                    return &*it;
            return nullptr;
        };
        const auto literal_of = [&](std::uint32_t node) -> std::optional<std::int64_t> {
            if (out.nodes[node].kind != expr_kind::number)
                return std::nullopt;
            const auto& r = out.nodes[node].range;
            const auto v =
                rational::parse(std::string_view(s.text_begin + r.begin, r.end - r.begin));
            if (!v || !v->is_integer())
                return std::nullopt;
            return v->num();
        };
        if (name == "VLOOKUP" || name == "HLOOKUP") {
            const bool rows = name == "HLOOKUP";
            const lowered_reference* table = count >= 3 ? reference_of(args[1]) : nullptr;
            const auto n = count >= 3 ? literal_of(args[2]) : std::nullopt;
            const auto key_line = table ? nth_line(table->area, 1, rows) : std::nullopt;
            const auto result_line = table && n ? nth_line(table->area, *n, rows) : std::nullopt;
            if (!key_line || !result_line) {
                s.not_checked = fmt::format("{} is checked only with a table range and a column "
                                            "number written as a number",
                                            name);
                out.nodes[call_index] = {expr_kind::reference, out.nodes[call_index].range,
                                         static_cast<std::uint32_t>(out.references.size())};
                out.references.emplace_back();
                return;
            }
            const std::size_t sheet = table->sheet;
            const span where = table->where;
            // The table as a whole is no operand: only its key and result lines are.
            s.book.references.erase(s.book.references.begin() + (table - s.book.references.data()));
            const std::uint32_t key_column = s.push_reference(where, sheet, *key_line);
            const std::uint32_t result_column = s.push_reference(where, sheet, *result_line);
            s.stack.operands.resize(s.stack.operands.size() - 2);
            args = {args[0], key_column, result_column};
        } else if (name == "INDEX" && count >= 1) {
            if (const lowered_reference* range = reference_of(args[0])) {
                std::optional<cell_area> line;
                if (range->area.first.column == range->area.last.column ||
                    range->area.first.row == range->area.last.row)
                    line = range->area;
                else if (count == 3)
                    if (const auto j = literal_of(args[2]))
                        line = nth_line(range->area, *j, false);
                if (line) {
                    const std::size_t sheet = range->sheet;
                    const span where = range->where;
                    s.book.references.erase(s.book.references.begin() +
                                            (range - s.book.references.data()));
                    args[0] = s.push_reference(where, sheet, *line);
                    s.stack.operands.pop_back();
                }
            }
        }
        const auto first = static_cast<std::uint32_t>(out.call_args.size());
        out.call_args.insert(out.call_args.end(), args.begin(), args.end());
        out.nodes[call_index].lhs = first;
        out.nodes[call_index].rhs = static_cast<std::uint32_t>(args.size());
    }
};
template <> struct action<g::group> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const std::uint32_t inner = s.pop();
        s.push_node({expr_kind::group, s.range(in), inner});
    }
};
template <> struct action<g::negation> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const std::uint32_t operand = s.pop();
        s.push_node({expr_kind::negate, s.range(in), operand});
    }
};
// x% is x/100: a pure number, so it neither carries a unit nor hides one.
template <> struct action<g::percent_mark> {
    template <typename In> static void apply(const In& in, lowering& s) {
        const std::uint32_t operand = s.pop();
        const span whole{s.out().nodes[operand].range.begin, s.range(in).end};
        s.stack.operands.push_back(operand);
        s.push_node({expr_kind::number, s.hundred});
        s.push_binary(expr_kind::divide);
        s.out().nodes[s.stack.operands.back()].range = whole;
    }
};
template <expr_kind Kind> struct binary_action {
    template <typename In> static void apply(const In& /*in*/, lowering& s) { s.push_binary(Kind); }
};
// '^' and comparisons chain to the left without nesting ("=2^2^2"), and the checker follows
// such a chain by recursion: a chain longer than the nesting limit is refused as deep nesting is.
template <expr_kind Kind> struct chained_action {
    template <typename In> static void apply(const In& in, lowering& s) {
        s.push_binary(Kind);
        const auto& nodes = s.out().nodes;
        int length = 0;
        for (std::uint32_t n = s.stack.operands.back(); nodes[n].kind == Kind; n = nodes[n].lhs)
            if (++length > max_nesting)
                throw formula_syntax_error{"this formula nests too deeply to check", in.begin()};
    }
};
template <> struct action<g::power_tail> : chained_action<expr_kind::power> {};
template <> struct action<g::multiply_tail> : binary_action<expr_kind::multiply> {};
template <> struct action<g::divide_tail> : binary_action<expr_kind::divide> {};
template <> struct action<g::add_tail> : binary_action<expr_kind::add> {};
template <> struct action<g::subtract_tail> : binary_action<expr_kind::subtract> {};
template <> struct action<g::comparison_tail> : chained_action<expr_kind::compare> {};
// Joined text has no dimension: the result is opaque, its parts are not checked.
template <> struct action<g::concat_tail> {
    template <typename In> static void apply(const In& /*in*/, lowering& s) {
        const std::uint32_t rhs = s.pop();
        const std::uint32_t lhs = s.pop();
        s.push_opaque({s.out().nodes[lhs].range.begin, s.out().nodes[rhs].range.end});
    }
};

} // namespace

std::optional<std::pair<std::size_t, cell_area>>
resolve_reference(const workbook& wb, std::size_t home, std::string_view text) {
    std::size_t sheet = home;
    const std::size_t bang = text.rfind('!');
    if (bang != std::string_view::npos) {
        std::string_view name = text.substr(0, bang);
        std::string unquoted;
        if (name.size() >= 2 && name.front() == '\'') {
            for (std::size_t i = 1; i + 1 < name.size(); ++i) {
                unquoted += name[i];
                if (name[i] == '\'' && name[i + 1] == '\'')
                    ++i;
            }
        } else {
            unquoted = std::string(name);
        }
        const std::string wanted = upper_ascii(unquoted);
        bool found = false;
        for (std::size_t i = 0; i < wb.sheets.size() && !found; ++i)
            if (upper_ascii(wb.sheets[i].name) == wanted) {
                sheet = i;
                found = true;
            }
        if (!found)
            return std::nullopt;
        text = text.substr(bang + 1);
    }
    const auto area = parse_area(text);
    if (!area)
        return std::nullopt;
    return std::pair{sheet, *area};
}

lowered_formula lower_formula(lowered_book& book, const workbook& wb, std::size_t sheet,
                              std::uint32_t begin, std::uint32_t end, span hundred) {
    lowered_formula result;
    result.first_reference = static_cast<std::uint32_t>(book.references.size());
    const std::string_view all = book.tree.source->text();
    lowering s{book, wb, sheet, all.data(), hundred, {}, {}, {}, 0};
    pg::memory_input in(all.data() + begin, all.data() + end, "formula");
    try {
        pg::parse<g::formula, action, control>(in, s);
    } catch (const formula_syntax_error& e) {
        result.syntax_error = e.message;
        const auto at = static_cast<std::uint32_t>(e.at - all.data());
        result.syntax_at = {at, std::min(at + 1, end)};
        book.references.resize(result.first_reference);
        return result;
    }
    if (s.stack.operands.size() != 1) {
        result.syntax_error = "unexpected text here";
        result.syntax_at = {begin, end};
        book.references.resize(result.first_reference);
        return result;
    }
    auto& tree = book.tree;
    tree.sides.push_back({s.stack.operands.back(), syntax::relation_kind::none});
    syntax::formula f{};
    f.range = tree.nodes[s.stack.operands.back()].range;
    f.first_side = static_cast<std::uint32_t>(tree.sides.size() - 1);
    f.side_count = 1;
    tree.formulas.push_back(f);
    result.formula = static_cast<std::uint32_t>(tree.formulas.size() - 1);
    result.reference_count =
        static_cast<std::uint32_t>(book.references.size()) - result.first_reference;
    result.not_checked = std::move(s.not_checked);
    return result;
}

} // namespace plumb::sheets
