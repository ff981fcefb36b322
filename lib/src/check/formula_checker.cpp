// Gives every subexpression a dimension and applies the rules where dimensions meet: the
// terms of a sum, the sides of a formula, function arguments and exponents.
#include "check/formula_checker.hpp"

#include "check/formula/checker.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <memory>

namespace plumb {

using formula_check::checker;
using formula_check::symbol_not_yet_declared;

// Exponents beyond the exact range: the formula's partial findings give way to one that says so.
static void replace_with_overflow(const syntax::parsed_file& file, const syntax::formula& formula,
                                  std::vector<diagnostic>& out, std::size_t before) {
    out.resize(before);
    diagnostic d;
    d.rule = std::string(rules::overflow);
    d.message = "the exponents in this formula exceed the exact range (64-bit numerator "
                "and denominator)";
    d.where = {file.source, formula.range};
    out.push_back(std::move(d));
}

static bool check_with(checker& c, const syntax::formula& formula, std::vector<diagnostic>& out,
                       bool defer_unknown) {
    c.begin(defer_unknown);
    const std::size_t before = out.size();
    try {
        c.check_formula(formula);
    } catch (const symbol_not_yet_declared&) {
        c.abandon();
        out.resize(before);
        return false;
    } catch (const arithmetic_overflow&) {
        c.abandon();
        replace_with_overflow(c.file(), formula, out, before);
    } catch (...) {
        c.abandon();
        throw;
    }
    // A formula reported stops being read at its first fault; the symbols after it are still
    // used by it, and no "never used" warning may follow.
    if (out.size() != before) [[unlikely]]
        c.mark_symbols_used(formula);
    return true;
}

bool check_formula(const syntax::parsed_file& file, const syntax::formula& formula,
                   symbol_table& symbols, std::vector<diagnostic>& out, bool defer_unknown) {
    checker c(file, symbols, out);
    return check_with(c, formula, out, defer_unknown);
}

struct formula_checker::state {
    state(const syntax::parsed_file& file, symbol_table& symbols, std::vector<diagnostic>& out)
        : c(file, symbols, out), out(out) {}
    checker c;
    std::vector<diagnostic>& out;
};

formula_checker::formula_checker(const syntax::parsed_file& file, symbol_table& symbols,
                                 std::vector<diagnostic>& out)
    : state_(std::make_unique<state>(file, symbols, out)) {}

formula_checker::~formula_checker() = default;

const syntax::parsed_file& formula_checker::file() const {
    return state_->c.file();
}

bool formula_checker::check(const syntax::formula& formula, bool defer_unknown) {
    return check_with(state_->c, formula, state_->out, defer_unknown);
}

std::optional<value_type> check_sheet_formula(const syntax::parsed_file& file,
                                              const syntax::formula& formula, symbol_table& symbols,
                                              std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    c.begin();
    const std::size_t before = out.size();
    try {
        return c.check_value(formula);
    } catch (const arithmetic_overflow&) {
        replace_with_overflow(file, formula, out, before);
        return std::nullopt;
    }
}

std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    c.begin();
    const std::size_t before = out.size();
    try {
        const auto t = c.eval(root);
        // A warning (an angle in degrees, a reading on an offset scale) leaves the dimension
        // known; only an error takes it away.
        const bool erred =
            std::any_of(out.begin() + static_cast<std::ptrdiff_t>(before), out.end(),
                        [](const diagnostic& d) { return d.level == severity::error; });
        if (!t.known || erred)
            return std::nullopt;
        return t.dim.expand();
    } catch (const arithmetic_overflow&) {
        diagnostic d;
        d.rule = std::string(rules::overflow);
        d.message = "the exponents in this expression exceed the exact range";
        d.where = {file.source, file.nodes[root].range};
        out.push_back(std::move(d));
        return std::nullopt;
    }
}

} // namespace plumb
