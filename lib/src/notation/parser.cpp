// Builds the syntax tree from PEGTL actions. Actions fire only on success, and every choice
// point in an expression either commits (must<>) or fails before any action ran, so the
// operand stack is always consistent.
#include "notation/parser.hpp"

#include "model/node_stack.hpp"
#include "notation/described_kind.hpp"

#include "plumb/constants.hpp"
#include "plumb/notation.hpp"
#include "plumb/notation_errors.hpp"
#include "plumb/rules.hpp"
#include "units/exact_factor.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdlib>
#include <cstring>
#include <fmt/core.h>
#include <numbers>
#include <optional>
#include <unordered_map>

namespace plumb {
namespace {

namespace pg = tao::pegtl;
namespace nt = plumb::notation;
using syntax::expr_kind;
using syntax::relation_kind;

// Raised by the control class at a hard-error point; carries the message from
// notation_errors.hpp and the byte where the grammar gave up.
struct syntax_failure {
    const char* message;
    const char* at;
};

// Nesting deeper than this is no formula a person wrote; refusing it keeps the parser's
// recursion (and the checker's) far from the stack's end on hostile input.
constexpr int max_nesting = 256;

struct parse_state;
int& nesting_depth(parse_state& s);
void note_statement_fields(parse_state& s);

template <typename Rule> struct control : pg::normal<Rule> {
    static constexpr bool nests =
        std::is_same_v<Rule, nt::unary> || std::is_same_v<Rule, nt::unit_primary>;
    // The rule each statement other than a formula starts with once its kind is certain (after
    // its lookahead), before any of its actions: only then are its pending fields written.
    static constexpr bool opens_statement =
        std::is_same_v<Rule, nt::name_list> || std::is_same_v<Rule, nt::cells_keyword> ||
        std::is_same_v<Rule, nt::measure_keyword> || std::is_same_v<Rule, nt::study_name> ||
        std::is_same_v<Rule, nt::case_kind>;

    // The expression rules recurse only through a group, a call's arguments and the operand
    // of a power, a negation or a '+'. Those, and a formula's sides, are each one function
    // with the rules below them inlined into it (flatten) down to the next such point. Left
    // to itself GCC broke the recursion at the unary rule and the product, entered at every
    // factor (issue 12: 149.7 M -> 147.3 M instructions on the benchmark's slice, for about
    // 470 kB more program text, of which a small check touches no more pages than before).
    static constexpr bool own_function =
        std::is_same_v<Rule, nt::group> || std::is_same_v<Rule, nt::call_arguments> ||
        std::is_same_v<Rule, nt::power_operand> || std::is_same_v<Rule, nt::negated_operand> ||
        std::is_same_v<Rule, nt::positive_operand> || std::is_same_v<Rule, nt::side> ||
        std::is_same_v<Rule, nt::first_side>;

    // A hand-written leaf without an action is called directly: through PEGTL's generic path
    // it stayed a call of its own at every use, which cost more than the leaf (issue 12).
    template <pg::apply_mode A, pg::rewind_mode M, template <typename...> class Action,
              template <typename...> class Control, typename Input, typename... States>
    [[nodiscard, gnu::always_inline]] static bool match(Input& in, States&&... st) {
        if constexpr (std::is_base_of_v<nt::leaves::hand_written_rule, Rule> &&
                      std::is_base_of_v<pg::nothing<Rule>, Action<Rule>>)
            return Rule::match(in);
        else if constexpr (own_function)
            return match_apart<A, M, Action, Control>(in, st...);
        else
            return pg::normal<Rule>::template match<A, M, Action, Control>(in, st...);
    }
    template <pg::apply_mode A, pg::rewind_mode M, template <typename...> class Action,
              template <typename...> class Control, typename Input, typename... States>
    [[nodiscard, gnu::noinline, gnu::flatten]] static bool match_apart(Input& in, States&&... st) {
        return pg::normal<Rule>::template match<A, M, Action, Control>(in, st...);
    }

    template <typename Input, typename... States>
    static void start(const Input& in, States&... st) {
        if constexpr (opens_statement)
            note_statement_fields(st...);
        if constexpr (nests) {
            if (++nesting_depth(st...) > max_nesting)
                throw syntax_failure{"this formula nests too deeply to check", in.current()};
        }
    }
    template <typename Input, typename... States>
    static void success(const Input& /*in*/, States&... st) {
        if constexpr (nests)
            --nesting_depth(st...);
    }
    template <typename Input, typename... States>
    static void failure(const Input& /*in*/, States&... st) {
        if constexpr (nests)
            --nesting_depth(st...);
    }

    template <typename Input, typename... States>
    [[noreturn]] static void raise(const Input& in, States&&... /*unused*/) {
        constexpr const char* own = nt::error_message<Rule>;
        throw syntax_failure{own != nullptr ? own : "unexpected text here", in.current()};
    }
};

// A unit expression's value while it is being built.
struct unit_value {
    dimension dim;
    double factor = 1.0;
    const unit_definition* single = nullptr;
    bool ok = true;
    bool constant = false;
    // The factor exactly, where every unit in it is defined exactly; else the double stands.
    std::optional<rational> exact = rational(1);
};

struct parse_state {
    parse_state(const source_file& f, syntax::parsed_file& o)
        : file(f), out(o), file_begin(f.text().data()) {}

    const source_file& file;
    syntax::parsed_file& out;
    const char* file_begin;
    const statement_sink* sink = nullptr; // for units defined in used files

    syntax::node_stack stack;
    std::vector<std::uint32_t> argument_counts;
    int depth = 0;
    bool in_braces = false;
    bool braces_after_number = false; // "8760 {h}": a unit, not the Planck constant
    bool line_has_inferred = false;
    // The statement "[L^(1/3) T^-1, SI 1 ± 0.1%]" of the coefficient being read, if any.
    std::optional<syntax::coefficient_statement> pending_statement;
    double pending_tolerance = 0.0;
    bool pending_tolerance_percent = false;
    bool pending_tolerance_stated = false;
    std::uint32_t formula_first_side = 0;
    relation_kind pending_relation = relation_kind::none;
    span pending_label{};

    // Declaration under construction.
    syntax::declared_kind pending_kind{};
    span pending_spec{}, pending_value{}, pending_description{};
    std::uint32_t pending_first_name = 0;
    bool spec_in_brackets = false;
    dimension bracket_dimension;
    base_dimension pending_base = base_dimension::mass;
    std::optional<rational> pending_exponent;
    // Whether this line wrote pending_kind or bracket_dimension: most lines are formulas that
    // never do, and clearing those two costs more than the rest of the line's reset.
    bool kind_written = false;
    // Whether this line started a statement other than a formula (see control): only such a
    // line writes the fields below pending_spec, so only after one need they be cleared.
    bool statement_fields_written = false;
    std::vector<unit_value> units;
    std::vector<std::size_t> unknown_units; // this line's unknown-unit diagnostics
    span pending_use_path{};
    span pending_cells_sheet{}, pending_cells_area{};
    span pending_unit_name{};
    bool pending_unit_ok = false;
    const unit_definition* pending_unit_base = nullptr; // a measure's lone unit, if offset
    dimension pending_unit_dim;
    double pending_unit_factor = 0.0;
    double pending_unit_size = 1.0;
    bool pending_unit_size_written_zero = false;
    std::optional<double> pending_origin; // SI value where a measure's scale reads zero
    dimension pending_origin_dim;
    span pending_origin_span{};
    std::uint32_t pending_dependent_count = 0;

    // Study and case under construction.
    span pending_study_name{};
    std::uint32_t line_first_study_name = 0;
    std::uint32_t pending_repeating_count = 0;
    std::uint32_t line_first_case_value = 0;
    bool pending_is_model = false;
    std::optional<double> pending_scale;
    span pending_scale_text{};
    std::optional<unit_value> pending_value_unit;
    span pending_value_unit_text{};
    std::uint32_t line_first_case_match = 0;
    std::optional<double> pending_match_tolerance;
    span pending_match_tolerance_text{};

    [[nodiscard]] span range(const char* b, const char* e) const {
        return {static_cast<std::uint32_t>(b - file_begin),
                static_cast<std::uint32_t>(e - file_begin)};
    }
    template <typename Input> [[nodiscard]] span range(const Input& in) const {
        return range(in.begin(), in.end());
    }
    [[nodiscard]] std::string_view text(span r) const {
        return {file_begin + r.begin, static_cast<std::size_t>(r.end - r.begin)};
    }

    // The file's own units by name (views into the source), so each unit written is found in
    // constant time however many `measure` lines there are. An index may be stale after a
    // failed line was rolled back, hence the check of the name.
    std::unordered_map<std::string_view, std::size_t> unit_index;

    [[nodiscard]] const syntax::defined_unit* find_defined_unit(std::string_view name) const {
        if (const auto it = unit_index.find(name); it != unit_index.end() &&
                                                   it->second < out.units.size() &&
                                                   out.units[it->second].name == name)
            return &out.units[it->second];
        return sink != nullptr ? sink->imported_unit(name) : nullptr;
    }

    // Called from the actions of every operand and operator: inlined there (issue 12).
    [[gnu::always_inline]] std::uint32_t push_node(syntax::expr_node n) {
        return stack.push(out, n);
    }
    [[gnu::always_inline]] std::uint32_t pop() { return stack.pop(); }
    [[gnu::always_inline]] void push_binary(expr_kind kind) { stack.push_binary(out, kind); }
    void reset_line() {
        depth = 0;
        in_braces = false;
        line_has_inferred = false;
        pending_statement.reset();
        stack.operands.clear();
        argument_counts.clear();
        pending_relation = relation_kind::none;
        pending_label = {};
        if (kind_written) {
            pending_kind = {};
            bracket_dimension = {};
            kind_written = false;
        }
        pending_exponent.reset();
        units.clear();
        unknown_units.clear();
        if (statement_fields_written) {
            clear_statement_fields();
            statement_fields_written = false;
        }
    }
    // Also where the lines' own parts of the tree start; only such statements add to those.
    void clear_statement_fields() {
        pending_spec = pending_value = pending_description = {};
        pending_first_name = static_cast<std::uint32_t>(out.names.size());
        spec_in_brackets = false;
        pending_study_name = pending_scale_text = {};
        pending_dependent_count = 0;
        pending_unit_size = 1.0;
        pending_unit_size_written_zero = false;
        pending_origin.reset();
        line_first_study_name = static_cast<std::uint32_t>(out.study_names.size());
        pending_repeating_count = 0;
        line_first_case_value = static_cast<std::uint32_t>(out.case_values.size());
        pending_is_model = false;
        pending_scale.reset();
        pending_value_unit.reset();
        line_first_case_match = static_cast<std::uint32_t>(out.case_matches.size());
        pending_match_tolerance.reset();
        pending_match_tolerance_text = {};
    }
    void report(std::string_view rule, std::string message, span where) {
        diagnostic d;
        d.level = severity::error;
        d.rule = std::string(rule);
        d.message = std::move(message);
        d.where = {&file, where};
        out.diagnostics.push_back(std::move(d));
        if (rule == rules::syntax)
            out.has_syntax_error = true; // exit status 2, as for the grammar's own errors
    }
};

int& nesting_depth(parse_state& s) {
    return s.depth;
}
void note_statement_fields(parse_state& s) {
    s.statement_fields_written = true;
}

// "(1/2)", "( -3 / 2 )", "-3", "0.5" to an exact rational.
std::optional<rational> exponent_value(std::string_view text) {
    std::string compact;
    for (char c : text)
        if (c != '(' && c != ')' && c != ' ' && c != '\t' && c != '+')
            compact += c;
    return rational::parse(compact);
}

// The unit (or constant) of a braced quantity is on the unit stack; it becomes a node.
template <typename In> void push_quantity(const In& in, parse_state& s) {
    const unit_value u = s.units.back();
    s.units.pop_back();
    syntax::quantity_literal q;
    if (u.ok)
        q.dim = u.dim;
    q.si_factor = u.factor;
    q.si_exact = u.constant ? std::nullopt : u.exact;
    q.single_unit = u.single;
    q.constant = u.constant;
    s.out.quantities.push_back(q);
    s.push_node({expr_kind::quantity, s.range(in),
                 static_cast<std::uint32_t>(s.out.quantities.size() - 1)});
}

template <typename Rule> struct action : pg::nothing<Rule> {};

// --- Expressions ---
// A number, a number with a unit in braces, or a number marked for inference.
template <> struct action<nt::number_term> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        // What ends the term tells its kind: a number ends in a digit or '.', a quantity in
        // '}', an inferred coefficient in '?' or in the ']' of its statement.
        const char last = in.string_view().back();
        if (last == '?' || last == ']') {
            s.line_has_inferred = true;
            std::uint32_t statement = syntax::no_index;
            if (s.pending_statement) {
                s.out.coefficient_statements.push_back(*s.pending_statement);
                statement = static_cast<std::uint32_t>(s.out.coefficient_statements.size() - 1);
                s.pending_statement.reset();
            }
            s.push_node({expr_kind::inferred, s.range(in), statement});
            return;
        }
        if (last == '}') {
            push_quantity(in, s);
            return;
        }
        s.push_node({expr_kind::number, s.range(in)});
    }
};
// --- What a coefficient is stated to be: 1.486?[L^(1/3) T^-1, SI 1 ± 0.1%] ---
template <> struct action<nt::stated_open> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_statement.emplace();
        s.bracket_dimension = {};
        s.pending_tolerance_stated = false;
        s.pending_tolerance_percent = false;
    }
};
template <> struct action<nt::stated_dimension> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        if (s.pending_statement)
            s.pending_statement->dim = s.bracket_dimension;
    }
};
template <> struct action<nt::stated_number> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        if (!s.pending_statement)
            return;
        const std::string_view t = in.string_view();
        const std::size_t end = t.find_first_not_of("0123456789.eE+-");
        const std::string digits(t.substr(0, end));
        double value = std::strtod(digits.c_str(), nullptr);
        // As precise as written: half a unit in the last digit ("1.84" is 1.835 to 1.845).
        const std::size_t e = digits.find_first_of("eE");
        const std::string mantissa = digits.substr(0, e);
        const std::size_t point = mantissa.find('.');
        const int decimals =
            point == std::string::npos ? 0 : static_cast<int>(mantissa.size() - point - 1);
        // Clamped: a huge exponent only has to give an infinite value, never overflow an int.
        const long power =
            e == std::string::npos
                ? 0
                : std::clamp(std::strtol(digits.c_str() + e + 1, nullptr, 10), -100000L, 100000L);
        double half_unit = 0.5 * std::pow(10.0, static_cast<double>(power - decimals));
        if (end != std::string_view::npos) { // a multiple of π
            value *= std::numbers::pi;
            half_unit *= std::numbers::pi;
        }
        s.pending_statement->si_value = value;
        s.pending_statement->tolerance = half_unit;
    }
};
template <> struct action<nt::stated_tolerance_number> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_tolerance = std::strtod(std::string(in.string_view()).c_str(), nullptr);
        s.pending_tolerance_stated = true;
    }
};
template <> struct action<nt::stated_percent> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_tolerance_percent = true;
    }
};
template <> struct action<nt::stated_value> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        if (!s.pending_statement || !s.pending_statement->si_value)
            return;
        s.pending_statement->value_text = s.range(in);
        if (s.pending_tolerance_stated)
            s.pending_statement->tolerance =
                s.pending_tolerance_percent
                    ? std::abs(*s.pending_statement->si_value) * s.pending_tolerance / 100.0
                    : s.pending_tolerance;
    }
};
template <> struct action<nt::coefficient_statement> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        if (s.pending_statement)
            s.pending_statement->range = s.range(in);
    }
};
template <> struct action<nt::quantity_term> {
    template <typename In> static void apply(const In& in, parse_state& s) { push_quantity(in, s); }
};
template <> struct action<nt::brace_open> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.in_braces = true;
        // "8760 {h}", "5 {kW*h}": after a number the braces hold a unit (the hour, the farad),
        // not the constants that "{h}" and "{F}" alone name.
        const char* before = in.begin();
        while (before > s.file_begin && (before[-1] == ' ' || before[-1] == '\t'))
            --before;
        s.braces_after_number = before > s.file_begin &&
                                ((before[-1] >= '0' && before[-1] <= '9') || before[-1] == '.');
    }
};
template <> struct action<nt::brace_close> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.in_braces = false;
    }
};
template <> struct action<nt::symbol> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        // pi is read as a name and told apart here: one rule fewer tried at every term.
        const std::string_view t = in.string_view();
        const bool is_pi = t.size() == 2 && (t == "pi" || t == "\u03C0");
        s.push_node({is_pi ? expr_kind::pi : expr_kind::symbol, s.range(in)});
    }
};
template <> struct action<nt::call_open> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.argument_counts.push_back(0);
    }
};
template <> struct action<nt::argument> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        ++s.argument_counts.back();
    }
};
// The function's name was pushed as a symbol; it becomes the call node.
template <> struct action<nt::call_arguments> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const std::uint32_t count = s.argument_counts.back();
        s.argument_counts.pop_back();
        const auto first = static_cast<std::uint32_t>(s.out.call_args.size());
        const std::size_t base = s.stack.operands.size() - count;
        for (std::size_t i = base; i < s.stack.operands.size(); ++i)
            s.out.call_args.push_back(s.stack.operands[i]);
        s.stack.operands.resize(base);
        syntax::expr_node& call = s.out.nodes[s.stack.operands.back()];
        call.kind = expr_kind::call;
        call.range.end = s.range(in).end;
        call.lhs = first;
        call.rhs = count;
    }
};
template <> struct action<nt::group> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const std::uint32_t inner = s.pop();
        s.push_node({expr_kind::group, s.range(in), inner});
    }
};
template <> struct action<nt::power_rest> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.push_binary(expr_kind::power);
    }
};
template <> struct action<nt::negation> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        // Up to the operand's end: the blanks after it are read but belong to no node.
        const std::uint32_t operand = s.pop();
        const span range{s.range(in).begin, s.out.nodes[operand].range.end};
        s.push_node({expr_kind::negate, range, operand});
    }
};
template <> struct action<nt::multiply_rest> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.push_binary(expr_kind::multiply);
    }
};
template <> struct action<nt::divide_rest> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.push_binary(expr_kind::divide);
    }
};
template <> struct action<nt::add_rest> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.push_binary(expr_kind::add);
    }
};
template <> struct action<nt::subtract_rest> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.push_binary(expr_kind::subtract);
    }
};

// --- Formulas ---
template <relation_kind Kind> struct relation_action {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_relation = Kind;
    }
};
template <> struct action<nt::equal> : relation_action<relation_kind::equal> {};
template <> struct action<nt::less> : relation_action<relation_kind::less> {};
template <> struct action<nt::less_equal> : relation_action<relation_kind::less_equal> {};
template <> struct action<nt::greater> : relation_action<relation_kind::greater> {};
template <> struct action<nt::greater_equal> : relation_action<relation_kind::greater_equal> {};

template <> struct action<nt::label_name> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_label = s.range(in);
    }
};
template <> struct action<nt::first_side> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.formula_first_side = static_cast<std::uint32_t>(s.out.sides.size());
        s.out.sides.push_back({s.pop(), relation_kind::none});
    }
};
template <> struct action<nt::side> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.out.sides.push_back({s.pop(), s.pending_relation});
    }
};
template <> struct action<nt::formula> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const auto count = static_cast<std::uint32_t>(s.out.sides.size()) - s.formula_first_side;
        // Up to the last side's end: the blanks after it are read but belong to no formula.
        const span range{s.range(in).begin, s.out.nodes[s.out.sides.back().root].range.end};
        s.out.formulas.push_back(
            {range, s.pending_label, s.formula_first_side, count, s.line_has_inferred});
    }
};

// --- Dimensions in brackets ---
template <base_dimension Base> struct base_action {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_base = Base;
        s.pending_exponent.reset();
    }
};
template <> struct action<nt::base_mass> : base_action<base_dimension::mass> {};
template <> struct action<nt::base_length> : base_action<base_dimension::length> {};
template <> struct action<nt::base_time> : base_action<base_dimension::time> {};
template <> struct action<nt::base_temperature> : base_action<base_dimension::temperature> {};
template <> struct action<nt::base_amount> : base_action<base_dimension::amount> {};
template <> struct action<nt::base_current> : base_action<base_dimension::current> {};
template <> struct action<nt::base_luminous> : base_action<base_dimension::luminous_intensity> {};

// "1/0", "(2/00)": an exponent that is no number because it divides by zero.
bool divides_by_zero(std::string_view exponent) {
    const std::size_t slash = exponent.find('/');
    if (slash == std::string_view::npos)
        return false;
    const std::string_view divisor = exponent.substr(slash + 1);
    const std::size_t digit = divisor.find_first_of("0123456789");
    return digit != std::string_view::npos &&
           divisor.find_first_not_of('0', digit) == divisor.find_first_not_of("0123456789", digit);
}

template <typename In> void read_exponent(const In& in, parse_state& s) {
    s.pending_exponent = exponent_value(in.string_view());
    if (!s.pending_exponent) {
        if (divides_by_zero(in.string_view()))
            s.report(rules::syntax, "this exponent divides by zero", s.range(in));
        else
            s.report(rules::overflow, "this exponent is too large to hold exactly", s.range(in));
        s.pending_exponent = rational(0);
    }
}
template <> struct action<nt::dimension_exponent> {
    template <typename In> static void apply(const In& in, parse_state& s) { read_exponent(in, s); }
};
template <> struct action<nt::dimension_factor> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.kind_written = true;
        s.bracket_dimension = s.bracket_dimension *
                              dimension::base(s.pending_base).pow(s.pending_exponent.value_or(1));
        s.pending_exponent.reset();
    }
};
template <> struct action<nt::dimension_brackets> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.spec_in_brackets = true;
    }
};

// --- Units ---
// A unit symbol as written, from the file's own units, the constants (in braces) or the table.
std::optional<unit_value> lookup_unit(std::string_view text, const parse_state& s) {
    if (s.in_braces && !s.braces_after_number) {
        if (const physical_constant* c = find_constant(text))
            return unit_value{c->dim(), c->value, nullptr, true, true, std::nullopt};
    }
    if (const syntax::defined_unit* own = s.find_defined_unit(text))
        return unit_value{own->dim, own->si_factor, own->origin ? &own->origin->row : nullptr,
                          true,     false,          std::nullopt};
    if (const auto unit = unit_table::standard().resolve(text))
        return unit_value{unit->dim(), unit->factor(), unit->prefix ? nullptr : unit->unit,
                          true,        false,          exact_factor(*unit)};
    return std::nullopt;
}

bool is_pressure(const dimension& d) {
    static const dimension pascal = unit_table::standard().resolve("Pa")->dim();
    return d == pascal;
}

// A unit symbol that ends in a gauge or absolute mark, "kPa(g)" or "kPa g", split into the
// unit and whether the mark says gauge; nothing when it carries no mark.
std::optional<std::pair<std::string_view, bool>> reading_mark(std::string_view text) {
    if (text.ends_with("(g)") || text.ends_with("(a)"))
        return std::pair{text.substr(0, text.size() - 3), text[text.size() - 2] == 'g'};
    const std::size_t blank = text.find_first_of(" \t");
    if (blank == std::string_view::npos)
        return std::nullopt;
    const std::size_t mark = text.find_last_of(" \t") + 1;
    return std::pair{text.substr(0, blank), text.substr(mark) == "g"};
}

// "psi(g)", "kPa(g)", "kPa g": the gauge row of that unit (psig, kPag); "kPa(a)", "kPa abs":
// the absolute unit. An empty result with a message when the mark does not fit the unit.
std::optional<unit_value> lookup_marked_unit(std::string_view text, std::string_view base,
                                             bool gauge, const parse_state& s, std::string& why) {
    const auto absolute = lookup_unit(base, s);
    if (!absolute || !is_pressure(absolute->dim) ||
        (absolute->single != nullptr && absolute->single->scale != unit_scale::absolute)) {
        why = fmt::format("'{}' marks a gauge or absolute pressure, but '{}' is not an absolute "
                          "pressure unit",
                          text, base);
        return std::nullopt;
    }
    if (!gauge)
        return absolute;
    const std::string gauge_symbol = std::string(base) + "g";
    const auto marked = lookup_unit(gauge_symbol, s);
    if (marked && marked->single != nullptr && marked->single->scale == unit_scale::gauge &&
        marked->factor == absolute->factor)
        return marked;
    why = fmt::format("no gauge form of '{}' is known; define one on a line of its own: measure "
                      "{} = {} zero at 101.325 kPa",
                      base, gauge_symbol, base);
    return std::nullopt;
}

// "m3", "mm4", "ft3": a digit after a symbol is its power, as in "m3/h" and "kg/m3". A row that
// ends in a digit ("ft3", "inH2O") is found as written before this is tried.
std::optional<unit_value> lookup_digit_power(std::string_view text, const parse_state& s) {
    if (text.size() < 2 || text.back() < '2' || text.back() > '9' ||
        (text[text.size() - 2] >= '0' && text[text.size() - 2] <= '9'))
        return std::nullopt;
    auto base = lookup_unit(text.substr(0, text.size() - 1), s);
    if (!base || base->constant)
        return std::nullopt;
    const int power = text.back() - '0';
    base->dim = base->dim.pow(rational(power));
    base->factor = std::pow(base->factor, power);
    base->exact = exact_power(base->exact, rational(power));
    base->single = nullptr;
    return base;
}

std::string unknown_unit_message(std::string_view text, const dimension* kind = nullptr) {
    std::string message = fmt::format("unknown unit '{}'", text);
    // "g/Nm^3": the gas volumes at reference conditions are rows of their own, Nm3 and Sm3,
    // which a power after a bare "Nm" does not reach.
    if (const std::string whole = std::string(text) + "3";
        text.size() >= 2 && unit_table::standard().resolve(whole))
        return message + fmt::format("; did you mean '{}'? It is written whole, as {} or {}\u00B3",
                                     whole, whole, text);
    // "in_wg", "inWC", "in.wg": the trades' inches of water gauge or column, which the
    // table spells inH2O; the nearest spelling alone would offer the inch of mercury.
    std::string letters;
    for (const char c : text)
        if (std::isalpha(static_cast<unsigned char>(c)) != 0)
            letters += static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    if (letters == "inwg" || letters == "inwc" || letters == "inchwg" || letters == "inchwc" ||
        letters == "inchesofwater")
        return message + "; the inch of water is written inH2O (a gauge reading inH2Og)";
    const auto near = unit_table::standard().nearest(text, 3, kind);
    if (!near.empty()) {
        message += "; did you mean ";
        for (std::size_t i = 0; i < near.size(); ++i)
            message += fmt::format("{}'{}'", i == 0 ? "" : (i + 1 == near.size() ? " or " : ", "),
                                   near[i]);
        message += "?";
    }
    return message;
}

// How to define the very unit that was not found. A name that reads as a pressure with a
// trailing "g" ("MPag") gets the gauge form.
std::string definition_template(std::string_view text, const parse_state& s) {
    if (text.size() > 1 && text.back() == 'g') {
        const std::string_view base = text.substr(0, text.size() - 1);
        if (const auto absolute = lookup_unit(base, s); absolute && is_pressure(absolute->dim))
            return fmt::format("measure {} = {} zero at 101.325 kPa", text, base);
    }
    return fmt::format("measure {} = <size> <known unit>", text);
}

template <> struct action<nt::unit_symbol> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const std::string_view text = in.string_view();
        std::string why;
        std::optional<unit_value> found;
        if (text.starts_with("deg") && text.size() > 3 && (text[3] == ' ' || text[3] == '\t'))
            found = lookup_unit(text.back() == 'C' ? "degC" : "degF", s);
        else if (const auto marked = reading_mark(text))
            found = lookup_marked_unit(text, marked->first, marked->second, s, why);
        else if (!(found = lookup_unit(text, s)))
            found = lookup_digit_power(text, s);
        if (found) {
            s.units.push_back(*found);
            return;
        }
        if (!why.empty()) {
            s.report(rules::unknown_unit, why, s.range(in));
        } else {
            s.report(rules::unknown_unit, unknown_unit_message(text), s.range(in));
            s.unknown_units.push_back(s.out.diagnostics.size() - 1);
            s.out.diagnostics.back().notes.push_back(
                {fmt::format("define it on a line of its own: {}; or declare the symbol by "
                             "its dimension, as in [L T^-1]; `plumb catalogue` lists the "
                             "built-in units",
                             definition_template(text, s)),
                 {}});
        }
        s.units.push_back({{}, 1.0, nullptr, false, false, std::nullopt});
    }
};
template <> struct action<nt::gas_volume_symbol> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const auto found = lookup_unit(in.string_view(), s);
        s.units.push_back(found ? *found
                                : unit_value{{}, 1.0, nullptr, false, false, std::nullopt});
    }
};
// m², s⁻¹: the exponent in superscript digits.
template <> struct action<nt::superscript_exponent> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        std::string plain;
        const std::string_view text = in.string_view();
        for (std::size_t i = 0; i < text.size();) {
            const auto lead = static_cast<unsigned char>(text[i]);
            const std::size_t length = lead >= 0xE0 ? 3 : 2;
            const std::string_view glyph = text.substr(i, length);
            i += length;
            if (glyph == "\u207B")
                plain += '-';
            else if (glyph == "\u00B9")
                plain += '1';
            else if (glyph == "\u00B2")
                plain += '2';
            else if (glyph == "\u00B3")
                plain += '3';
            else if (glyph == "\u2070")
                plain += '0';
            else if (glyph != "\u207A")
                plain += static_cast<char>('0' + (static_cast<unsigned char>(glyph[2]) - 0xB0));
        }
        s.pending_exponent = exponent_value(plain);
        if (!s.pending_exponent) {
            s.report(rules::overflow, "this exponent is too large to hold exactly", s.range(in));
            s.pending_exponent = rational(0);
        }
    }
};
// Δ°C, Δbarg: a difference on that scale is an ordinary quantity, with no zero to mind.
template <> struct action<nt::unit_difference> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.back().single = nullptr;
    }
};
template <> struct action<nt::unit_one> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.push_back({});
    }
};
template <> struct action<nt::unit_percent> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.push_back({{}, 0.01, nullptr, true, false, rational(1, 100)});
    }
};
template <> struct action<nt::unit_per_mille> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.push_back({{}, 0.001, nullptr, true, false, rational(1, 1000)});
    }
};
template <> struct action<nt::unit_currency> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.push_back({{}, 1.0, nullptr, true, false, rational(1)});
    }
};
template <> struct action<nt::unit_exponent> {
    template <typename In> static void apply(const In& in, parse_state& s) { read_exponent(in, s); }
};
// A unit's size that a double cannot hold (0 or infinity) would silently turn off the scale
// checks for every symbol declared in it: it is an error instead.
template <typename In> void refuse_unheld_size(const In& in, parse_state& s, unit_value& v) {
    if (!v.ok || (std::isfinite(v.factor) && v.factor > 0.0))
        return;
    s.report(rules::syntax,
             fmt::format("the size of this unit in SI units is too {} to hold (it comes to {})",
                         v.factor == 0.0 ? "small" : "large", v.factor == 0.0 ? "0" : "infinity"),
             s.range(in));
    v.ok = false;
}

template <> struct action<nt::unit_power> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        if (!s.pending_exponent)
            return;
        unit_value& top = s.units.back();
        const rational e = *s.pending_exponent;
        s.pending_exponent.reset();
        top.dim = top.dim.pow(e);
        top.factor = std::pow(top.factor, e.to_double());
        top.exact = exact_power(top.exact, e); // a rational power is left to the double
        top.single = nullptr;
        refuse_unheld_size(in, s, top);
    }
};
template <> struct action<nt::unit_factor> : action<nt::unit_power> {};
template <> struct action<nt::spaced_unit_factor> : action<nt::unit_power> {};
template <> struct action<nt::unit_group> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.units.back().single = nullptr;
    }
};
template <bool Divide> struct unit_combine {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const unit_value rhs = s.units.back();
        s.units.pop_back();
        unit_value& lhs = s.units.back();
        lhs.dim = Divide ? lhs.dim / rhs.dim : lhs.dim * rhs.dim;
        lhs.factor = Divide ? lhs.factor / rhs.factor : lhs.factor * rhs.factor;
        lhs.exact = exact_product(lhs.exact, rhs.exact, Divide);
        lhs.single = nullptr;
        lhs.ok = lhs.ok && rhs.ok;
        refuse_unheld_size(in, s, lhs);
    }
};
template <> struct action<nt::unit_multiply> : unit_combine<false> {};
template <> struct action<nt::unit_divide> : unit_combine<true> {};
template <> struct action<nt::unit_spaced_multiply> : unit_combine<false> {};

// --- Declarations ---
template <> struct action<nt::declared_name> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.names.push_back({s.range(in), static_cast<std::uint32_t>(s.out.declarations.size())});
    }
};
template <> struct action<nt::declaration_spec> {
    template <typename In> static void apply(const In& in, parse_state& s) { take_spec(in, s); }
    template <typename In> static void take_spec(const In& in, parse_state& s) {
        s.pending_spec = s.range(in);
        s.kind_written = true;
        if (in.string_view() == "?") {
            s.pending_kind.to_infer = true;
            return;
        }
        if (s.spec_in_brackets) {
            s.pending_kind.dim = s.bracket_dimension;
            return;
        }
        const unit_value& v = s.units.back();
        if (v.ok)
            s.pending_kind.dim = v.dim;
        s.pending_kind.si_factor = v.factor;
        s.pending_kind.si_exact = v.exact;
        s.pending_kind.single_unit = v.single;
        s.pending_kind.by_unit = true;
    }
};
template <> struct action<nt::constant_value> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_value = s.range(in);
    }
};
template <> struct action<nt::description_text> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_description = s.range(in);
    }
};
// An unknown unit's suggestions, ranked again once the description says what kind of quantity
// the symbol is.
void rank_suggestions_by_description(parse_state& s) {
    if (s.unknown_units.empty() || s.pending_description.begin == s.pending_description.end)
        return;
    const auto kind = described_kind(s.text(s.pending_description));
    if (!kind)
        return;
    for (const std::size_t i : s.unknown_units) {
        diagnostic& d = s.out.diagnostics[i];
        d.message = unknown_unit_message(s.text(d.where.range), &*kind);
    }
}

// "T_s : C "supply temperature"": C is the coulomb and F the farad. A temperature declared so
// passes every formula that multiplies it, with no word about its zero.
void refuse_charge_for_temperature(parse_state& s) {
    if (!s.pending_kind.by_unit || !s.pending_kind.dim)
        return;
    const dimension& d = *s.pending_kind.dim;
    if (d.exponent(base_dimension::current).is_zero() ||
        !d.exponent(base_dimension::temperature).is_zero() ||
        s.pending_description.begin == s.pending_description.end)
        return;
    const std::string_view spec = s.text(s.pending_spec);
    const auto is_name_byte = [](char c) {
        return std::isalnum(static_cast<unsigned char>(c)) != 0 || c == '_' ||
               static_cast<unsigned char>(c) >= 0x80;
    };
    bool lone_scale_letter = false;
    for (std::size_t i = 0; i < spec.size() && !lone_scale_letter; ++i)
        lone_scale_letter = (spec[i] == 'C' || spec[i] == 'F') &&
                            (i == 0 || !is_name_byte(spec[i - 1])) &&
                            (i + 1 == spec.size() || !is_name_byte(spec[i + 1]));
    if (!lone_scale_letter || !describes_a_temperature(s.text(s.pending_description)))
        return;
    s.report(
        rules::unknown_unit,
        fmt::format("'{}' reads C as the coulomb and F as the farad, but the description "
                    "says a temperature: write \u00B0C or \u00B0F (or degC, degF) for the scales, "
                    "K or \u0394\u00B0C for a difference",
                    spec),
        s.pending_spec);
}

template <> struct action<nt::declaration> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        rank_suggestions_by_description(s);
        refuse_charge_for_temperature(s);
        const auto count = static_cast<std::uint32_t>(s.out.names.size()) - s.pending_first_name;
        s.out.declarations.push_back({s.range(in), s.pending_spec, s.pending_description,
                                      s.pending_value, s.pending_kind, s.pending_first_name,
                                      count});
    }
};

// --- cells SHEET!AREA : unit ---
template <> struct action<nt::cells_sheet> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_cells_sheet = s.range(in);
    }
};
template <> struct action<nt::cells_area> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_cells_area = s.range(in);
    }
};
template <> struct action<nt::cells_spec> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        action<nt::declaration_spec>::take_spec(in, s);
    }
};
template <> struct action<nt::cells_statement> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        rank_suggestions_by_description(s);
        s.out.cells.push_back({s.range(in), s.pending_cells_sheet, s.pending_cells_area,
                               s.pending_spec, s.pending_description, s.pending_kind});
    }
};

// --- measure NAME = [number] unit [zero at number unit] ---
template <> struct action<nt::new_unit_size> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const std::string text(in.string_view());
        s.pending_unit_size = std::strtod(text.c_str(), nullptr);
        // "0" or "0.0e5" is a size of zero; "1e-400" is a size too small to hold.
        const std::string_view mantissa =
            std::string_view(text).substr(0, text.find_first_of("eE"));
        s.pending_unit_size_written_zero = mantissa.find_first_of("123456789") == std::string::npos;
    }
};
template <> struct action<nt::origin_value> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const unit_value u = s.units.back();
        s.units.pop_back();
        const std::string text(in.string_view());
        const double number = std::strtod(text.c_str(), nullptr);
        // "zero at 14.696 psi": the origin is an absolute value; a gauge origin reads from
        // its own zero, so it is added in.
        s.pending_origin = number * u.factor + (u.single ? u.single->offset : 0.0);
        s.pending_origin_dim = u.dim;
        s.pending_origin_span = s.range(in);
        s.pending_unit_ok = s.pending_unit_ok && u.ok;
    }
};
template <> struct action<nt::new_unit_name> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_unit_name = s.range(in);
    }
};
template <> struct action<nt::measure_keyword> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_unit_ok = true;
    }
};
template <> struct action<nt::new_unit_value> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        // The size's unit sits below the origin's (already taken) on the stack.
        const unit_value u = s.units.back();
        s.units.pop_back();
        s.pending_unit_ok = s.pending_unit_ok && u.ok;
        s.pending_unit_dim = u.dim;
        s.pending_unit_base = u.single;
        s.pending_unit_factor = s.pending_unit_size * u.factor;
    }
};
template <> struct action<nt::measure_statement> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        const std::string_view name = s.file.text(s.pending_unit_name);
        if (!s.pending_unit_ok)
            return; // its unit was unknown, and said so
        const std::optional<unit_value> known = lookup_unit(name, s);
        // "measure Nm3 = m^3" where the table has Nm3 already, of the same size: the file says
        // what plumb already knows, which is no conflict.
        // So is "measure mbarg = mbar zero at 101.325 kPa", written before the table had it:
        // the same size, scale and zero.
        const auto zero_of = [](const unit_definition* row) {
            return row != nullptr && row->scale != unit_scale::absolute ? row->offset : 0.0;
        };
        const auto scale_of = [](const unit_definition* row) {
            return row != nullptr ? row->scale : unit_scale::absolute;
        };
        const double pending_zero =
            s.pending_origin ? *s.pending_origin : zero_of(s.pending_unit_base);
        const unit_scale pending_scale =
            s.pending_origin
                ? (is_pressure(s.pending_unit_dim) ? unit_scale::gauge : unit_scale::offset)
                : scale_of(s.pending_unit_base);
        if (known && known->dim == s.pending_unit_dim &&
            std::abs(known->factor / s.pending_unit_factor - 1.0) <= 1e-12 &&
            scale_of(known->single) == pending_scale &&
            std::abs(zero_of(known->single) - pending_zero) <=
                1e-9 * std::max(1.0, std::abs(pending_zero)))
            return;
        if (known || s.find_defined_unit(name) != nullptr) {
            s.report(rules::conflicting_declaration,
                     fmt::format("'{}' is already a unit; choose another name for this one", name),
                     s.pending_unit_name);
            return;
        }
        if (s.pending_unit_size == 0.0 && s.pending_unit_size_written_zero) {
            s.report(rules::syntax, "a unit's size must be a positive number", s.pending_unit_name);
            return;
        }
        if (!(s.pending_unit_factor > 0.0) || !std::isfinite(s.pending_unit_factor)) {
            s.report(rules::syntax,
                     fmt::format("the size of '{}' in SI units is too {} to hold (it comes to {})",
                                 name, s.pending_unit_factor == 0.0 ? "small" : "large",
                                 s.pending_unit_factor == 0.0 ? "0" : "infinity"),
                     s.pending_unit_name);
            return;
        }
        if (s.pending_origin && s.pending_origin_dim != s.pending_unit_dim) {
            s.report(rules::conflicting_declaration,
                     fmt::format("the zero is given in {}, but the unit measures {}",
                                 s.pending_origin_dim.to_string(), s.pending_unit_dim.to_string()),
                     s.pending_origin_span);
            return;
        }
        syntax::defined_unit unit{std::string(name), s.pending_unit_dim, s.pending_unit_factor,
                                  s.pending_unit_name, nullptr};
        // An origin of its own, or the one of the offset unit it is measured in (0.01 barg).
        const unit_definition* base = s.pending_unit_base;
        const bool inherits = base != nullptr && base->scale != unit_scale::absolute;
        if (s.pending_origin || inherits) {
            auto origin = std::make_shared<syntax::defined_unit::scale_row>();
            origin->symbol = name;
            origin->name = fmt::format("{} (a unit of this file's own)", name);
            unit_definition& row = origin->row;
            for (std::size_t i = 0; i < base_dimension_count; ++i) {
                const rational e = s.pending_unit_dim.exponent(static_cast<base_dimension>(i));
                if (!e.is_integer() || e.num() > 100 || e.num() < -100) {
                    s.report(rules::syntax,
                             "a unit with a zero of its own must have whole-number exponents",
                             s.pending_unit_name);
                    return;
                }
                row.exponents[i] = static_cast<std::int8_t>(e.num());
            }
            row.factor = s.pending_unit_factor;
            row.offset = s.pending_origin ? *s.pending_origin : base->offset;
            row.scale =
                inherits && !s.pending_origin
                    ? base->scale
                    : (is_pressure(s.pending_unit_dim) ? unit_scale::gauge : unit_scale::offset);
            row.takes_prefixes = false;
            row.source = "defined in this file";
            row.symbol = origin->symbol;
            row.name = origin->name;
            unit.origin = std::move(origin);
        }
        s.out.units.push_back(std::move(unit));
        s.unit_index[name] = s.out.units.size() - 1;
    }
};

// --- use "path" ---
template <> struct action<nt::use_path_text> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_use_path = s.range(in);
    }
};
template <> struct action<nt::use_statement> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.uses.push_back({s.range(in), s.pending_use_path});
    }
};

// --- Studies ---
template <> struct action<nt::study_name> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_study_name = s.range(in);
    }
};
template <> struct action<nt::study_dependent> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.study_names.push_back(s.range(in));
        ++s.pending_dependent_count;
    }
};
template <> struct action<nt::study_variable> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.study_names.push_back(s.range(in));
    }
};
template <> struct action<nt::repeating_variable> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.study_names.push_back(s.range(in));
        ++s.pending_repeating_count;
    }
};
template <> struct action<nt::study_statement> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const auto total =
            static_cast<std::uint32_t>(s.out.study_names.size()) - s.line_first_study_name;
        s.out.studies.push_back({s.range(in), s.pending_study_name, s.line_first_study_name,
                                 s.pending_dependent_count,
                                 total - s.pending_dependent_count - s.pending_repeating_count,
                                 s.pending_repeating_count});
    }
};

// --- Prototype and model values ---
template <> struct action<nt::model_keyword> {
    template <typename In> static void apply(const In& /*in*/, parse_state& s) {
        s.pending_is_model = true;
    }
};
template <> struct action<nt::scale_value> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const std::string text(in.string_view());
        s.pending_scale_text = s.range(in);
        const auto colon = text.find(':');
        if (colon == std::string::npos) {
            s.pending_scale = std::strtod(text.c_str(), nullptr);
            return;
        }
        const double model = std::strtod(text.substr(0, colon).c_str(), nullptr);
        const double prototype = std::strtod(text.substr(colon + 1).c_str(), nullptr);
        s.pending_scale = prototype > 0 ? model / prototype : 0.0;
    }
};
template <> struct action<nt::value_unit> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_value_unit_text = s.range(in);
        s.pending_value_unit = s.units.back();
        s.units.pop_back();
    }
};
template <> struct action<nt::value_assignment> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        // The name is the text before '='; the quantity follows it.
        const std::string_view text = in.string_view();
        const std::size_t eq = text.find('=');
        std::size_t name_end = eq;
        while (name_end > 0 && (text[name_end - 1] == ' ' || text[name_end - 1] == '\t'))
            --name_end;
        std::size_t value_begin = eq + 1;
        while (value_begin < text.size() && (text[value_begin] == ' ' || text[value_begin] == '\t'))
            ++value_begin;
        const span whole = s.range(in);
        syntax::case_value v;
        v.name = {whole.begin, whole.begin + static_cast<std::uint32_t>(name_end)};
        v.value = {whole.begin + static_cast<std::uint32_t>(value_begin), whole.end};
        const double number = std::strtod(std::string(text.substr(value_begin)).c_str(), nullptr);
        if (s.pending_value_unit) {
            v.has_unit = true;
            v.unit = s.pending_value_unit_text;
            if (s.pending_value_unit->ok) {
                v.dim = s.pending_value_unit->dim;
                const unit_definition* single = s.pending_value_unit->single;
                v.unit_factor = s.pending_value_unit->factor;
                v.unit_offset = single ? single->offset : 0.0;
                v.si_value = number * v.unit_factor + v.unit_offset;
            }
        } else {
            v.dim = dimension{};
            v.si_value = number;
        }
        s.pending_value_unit.reset();
        s.out.case_values.push_back(v);
    }
};
template <> struct action<nt::case_statement> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        const auto count =
            static_cast<std::uint32_t>(s.out.case_values.size()) - s.line_first_case_value;
        const auto matches =
            static_cast<std::uint32_t>(s.out.case_matches.size()) - s.line_first_case_match;
        s.out.cases.push_back({s.range(in), s.pending_study_name, s.pending_is_model,
                               s.pending_scale, s.pending_scale_text, s.line_first_case_value,
                               count, s.line_first_case_match, matches, s.pending_match_tolerance,
                               s.pending_match_tolerance_text});
    }
};
template <> struct action<nt::match_target> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.out.case_matches.push_back(s.range(in));
    }
};
template <> struct action<nt::tolerance_percent> {
    template <typename In> static void apply(const In& in, parse_state& s) {
        s.pending_match_tolerance_text = s.range(in);
        s.pending_match_tolerance =
            std::strtod(std::string(in.string_view()).c_str(), nullptr) / 100.0;
    }
};

// Where the next '\' of a file stands: only a line with one can continue, and most have none.
// Found once for all the lines before it rather than searched for on each line (issue 12).
class backslash_finder {
  public:
    explicit backslash_finder(std::string_view text) : text_(text) {}
    // Whether [from, to) holds a '\'; `from` never decreases from one call to the next.
    bool any_in(std::size_t from, std::size_t to) {
        if (!found_ || next_ < from) {
            const void* at = std::memchr(text_.data() + from, '\\', text_.size() - from);
            next_ = at ? static_cast<std::size_t>(static_cast<const char*>(at) - text_.data())
                       : text_.size();
            found_ = true;
        }
        return next_ < to;
    }

  private:
    std::string_view text_;
    std::size_t next_ = 0;
    bool found_ = false;
};

// The end of the logical line whose first physical line is `line` (1-based): physical lines
// whose last character before any comment is '\' continue onto the next. Quotes shield '#'
// inside descriptions. The ends of physical lines come from the file's line index, made when
// it was read, rather than from a second search for each line break (issue 12). `line` is
// left at the physical line after the logical one.
std::size_t logical_line_end(const source_file& file, std::uint32_t& line,
                             backslash_finder& backslashes) {
    const std::string_view text = file.text();
    while (true) {
        const std::size_t pos = file.line_start(line);
        const bool last = line == file.line_count();
        const std::size_t end = last ? text.size() : file.line_start(line + 1) - 1;
        ++line;
        if (!backslashes.any_in(pos, end))
            return end;
        std::size_t content_end = end;
        // Most lines have no comment; only those need the quote-aware scan.
        if (std::memchr(text.data() + pos, '#', end - pos) != nullptr) {
            bool in_quotes = false;
            for (std::size_t i = pos; i < end; ++i) {
                const char c = text[i];
                if (c == '"')
                    in_quotes = !in_quotes;
                else if (c == '#' && !in_quotes) {
                    content_end = i;
                    break;
                }
            }
        }
        while (content_end > pos &&
               (text[content_end - 1] == ' ' || text[content_end - 1] == '\t' ||
                text[content_end - 1] == '\r'))
            --content_end;
        const bool continues = content_end > pos && text[content_end - 1] == '\\' && !last;
        if (!continues)
            return end;
    }
}

// Rolls back whatever a failed line added, so the tree holds only complete statements.
struct tree_mark {
    std::size_t nodes, call_args, quantities, sides, formulas, declarations, names, uses, units,
        studies, study_names, cases, case_values, case_matches, cells, diagnostics,
        coefficient_statements;
    explicit tree_mark(const syntax::parsed_file& f)
        : nodes(f.nodes.size()), call_args(f.call_args.size()), quantities(f.quantities.size()),
          sides(f.sides.size()), formulas(f.formulas.size()), declarations(f.declarations.size()),
          names(f.names.size()), uses(f.uses.size()), units(f.units.size()),
          studies(f.studies.size()), study_names(f.study_names.size()), cases(f.cases.size()),
          case_values(f.case_values.size()), case_matches(f.case_matches.size()),
          cells(f.cells.size()), diagnostics(f.diagnostics.size()),
          coefficient_statements(f.coefficient_statements.size()) {}
    void restore(syntax::parsed_file& f) const {
        f.nodes.resize(nodes);
        f.call_args.resize(call_args);
        f.quantities.resize(quantities);
        f.sides.resize(sides);
        f.formulas.resize(formulas);
        f.declarations.resize(declarations);
        f.names.resize(names);
        f.uses.resize(uses);
        f.units.resize(units);
        f.studies.resize(studies);
        f.study_names.resize(study_names);
        f.cases.resize(cases);
        f.case_values.resize(case_values);
        f.case_matches.resize(case_matches);
        f.cells.resize(cells);
        f.diagnostics.resize(diagnostics);
        f.coefficient_statements.resize(coefficient_statements);
    }
};

// Passes the statement a line added to the sink; drops a formula's tree once it is checked,
// and says whether it did.
bool tell(statement_sink& sink, syntax::parsed_file& out, const tree_mark& mark) {
    if (out.uses.size() > mark.uses)
        sink.on_use(out, out.uses.back());
    if (out.declarations.size() > mark.declarations)
        sink.on_declaration(out, static_cast<std::uint32_t>(out.declarations.size() - 1));
    if (out.formulas.size() > mark.formulas && sink.on_formula(out, out.formulas.back())) {
        // Only ever shorter: erasing the tail skips resize's test for growing.
        const auto cut = [](auto& v, std::size_t n) {
            v.erase(v.begin() + static_cast<std::ptrdiff_t>(n), v.end());
        };
        cut(out.nodes, mark.nodes);
        cut(out.call_args, mark.call_args);
        cut(out.quantities, mark.quantities);
        cut(out.sides, mark.sides);
        cut(out.coefficient_statements, mark.coefficient_statements);
        cut(out.formulas, mark.formulas);
        return true;
    }
    return false;
}

bool is_word_byte(char c) {
    const auto u = static_cast<unsigned char>(c);
    return std::isalnum(u) != 0 || c == '_' || c == '\'' || u >= 0x80;
}

// First attempts that stop the grammar where two terms stand side by side: "ρ g h" (a product
// without '*') and "101.325 kPa" (a quantity without braces). The grammar only knows that it
// wanted an operator; the words around the place say which of the two was meant.
std::string side_by_side_hint(std::string_view line, std::size_t at, const parse_state& s) {
    std::size_t before = at;
    while (before > 0 && (line[before - 1] == ' ' || line[before - 1] == '\t'))
        --before;
    std::size_t next = at;
    while (next < line.size() && (line[next] == ' ' || line[next] == '\t'))
        ++next;
    if (before == at || before == 0 || next >= line.size() || !is_word_byte(line[next]) ||
        std::isdigit(static_cast<unsigned char>(line[next])) != 0)
        return {};
    std::size_t word_end = next;
    while (word_end < line.size() && is_word_byte(line[word_end]))
        ++word_end;
    const std::string_view word = line.substr(next, word_end - next);
    std::size_t token = before;
    while (token > 0 && is_word_byte(line[token - 1]))
        --token;
    const std::string_view previous = line.substr(token, before - token);
    const bool number_before =
        !previous.empty() && std::isdigit(static_cast<unsigned char>(previous.front())) != 0;
    if (number_before || (token > 0 && line[token - 1] == '.')) {
        // Take the whole number (digits, '.', an exponent) and the unit as far as it runs.
        std::size_t number_begin = token;
        while (number_begin > 0 &&
               (std::isdigit(static_cast<unsigned char>(line[number_begin - 1])) != 0 ||
                line[number_begin - 1] == '.'))
            --number_begin;
        std::size_t unit_end = next;
        while (unit_end < line.size() &&
               (is_word_byte(line[unit_end]) || line[unit_end] == '/' || line[unit_end] == '^' ||
                line[unit_end] == '(' || line[unit_end] == ')'))
            ++unit_end;
        if (!lookup_unit(word, s))
            return {};
        return fmt::format("a number and its unit in a formula go in braces: write {} {{{}}}",
                           line.substr(number_begin, before - number_begin),
                           line.substr(next, unit_end - next));
    }
    if (previous.empty() && line[before - 1] != ')')
        return {};
    return fmt::format("two terms stand side by side; a product needs '*' between its factors, "
                       "as in {}*{}",
                       previous.empty() ? std::string_view("(...)") : previous, word);
}

// Past this many, a file is more likely not ours at all than a calc with typos.
constexpr std::size_t max_syntax_errors = 50;

} // namespace

syntax::parsed_file parse_expression(const source_file& file) {
    syntax::parsed_file out;
    out.source = &file;
    const std::string_view text = file.text();
    parse_state state(file, out);
    state.reset_line();
    pg::memory_input<pg::tracking_mode::lazy, pg::eol::lf_crlf, const char*> in(
        text.data(), text.data() + text.size(), "");
    try {
        pg::parse<nt::query, action, control>(in, state);
    } catch (const syntax_failure& failure) {
        const auto at = static_cast<std::uint32_t>(failure.at - text.data());
        state.report(
            rules::syntax, failure.message,
            {at, std::min<std::uint32_t>(at + 1, static_cast<std::uint32_t>(text.size()))});
        out.has_syntax_error = true;
    } catch (const arithmetic_overflow&) {
        state.report(rules::overflow, "the exponents in this expression exceed the exact range",
                     state.range(text.data(), text.data() + text.size()));
    }
    return out;
}

syntax::parsed_file parse_file(const source_file& file, statement_sink* sink) {
    syntax::parsed_file out;
    out.source = &file;
    const std::string_view text = file.text();
    parse_state state(file, out);
    state.sink = sink;

    std::size_t begin = 0;
    std::size_t syntax_errors = 0;
    // Where the tree stood before the line being parsed. A line either succeeds with exactly
    // its own statement added or fails and is rolled back: the grammar commits (must<>) before
    // any action of a statement runs. So after a formula that was checked and dropped, only
    // the diagnostics can have moved, and the mark need not be taken again in full (issue 12).
    tree_mark mark(out);
    backslash_finder backslashes(text);
    std::uint32_t line = 1; // the physical line that starts at `begin`
    while (begin <= text.size()) {
        const std::size_t end = logical_line_end(file, line, backslashes);
        if (syntax_errors == max_syntax_errors) {
            state.report(rules::syntax,
                         "too many syntax errors; the rest of this file is not checked (is it a "
                         ".plumb file?)",
                         state.range(text.data() + begin, text.data() + begin));
            break;
        }
        state.reset_line();
        pg::memory_input<pg::tracking_mode::lazy, pg::eol::lf_crlf, const char*> in(
            text.data() + begin, text.data() + end, "");
        try {
            pg::parse<nt::line, action, control>(in, state);
            if (sink != nullptr && tell(*sink, out, mark))
                mark.diagnostics = out.diagnostics.size();
            else
                mark = tree_mark(out);
        } catch (const syntax_failure& failure) {
            mark.restore(out);
            const auto at = static_cast<std::uint32_t>(failure.at - text.data());
            // Underline the offending character (a whole UTF-8 sequence), or the line's end.
            std::uint32_t stop = at;
            if (stop < end) {
                ++stop;
                while (stop < end && (static_cast<unsigned char>(text[stop]) & 0xC0) == 0x80)
                    ++stop;
            }
            std::string message = failure.message;
            if (failure.message == nt::error_message<nt::line_end> ||
                failure.message == nt::error_message<nt::relation>) {
                const std::string hint =
                    side_by_side_hint(text.substr(begin, end - begin), at - begin, state);
                if (!hint.empty())
                    message = hint;
            }
            state.report(rules::syntax, std::move(message), {at, stop});
            mark.diagnostics = out.diagnostics.size();
            out.has_syntax_error = true;
            ++syntax_errors;
        } catch (const arithmetic_overflow&) {
            mark.restore(out);
            state.report(rules::overflow, "the exponents on this line exceed the exact range",
                         state.range(text.data() + begin, text.data() + end));
            mark.diagnostics = out.diagnostics.size();
        }
        if (end >= text.size())
            break;
        begin = end + 1;
    }
    return out;
}

} // namespace plumb
