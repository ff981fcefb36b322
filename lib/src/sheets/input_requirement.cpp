#include "sheets/input_requirement.hpp"

#include "check/functions.hpp"
#include "plumb/source.hpp"

#include <cmath>
#include <stdexcept>

namespace plumb::sheets {
namespace {

using syntax::expr_kind;

// A subexpression's dimension as a function of the input's, u: base · u^k, and its scale
// s · σ^k likewise, σ being the SI value of the input's unit.
struct affine {
    dimension base;
    rational k = 0;
    double scale = 1.0;
};

// Whether a number stands in the formula other than as an exponent: it may be a conversion
// factor, so the formula does not fix the input's scale.
bool has_factor_numbers(const syntax::parsed_file& file, std::uint32_t root) {
    std::vector<std::uint32_t> stack{root};
    while (!stack.empty()) {
        const syntax::expr_node& n = file.nodes[stack.back()];
        stack.pop_back();
        switch (n.kind) {
        case expr_kind::number:
            return true;
        case expr_kind::power:
            stack.push_back(n.lhs);
            break;
        case expr_kind::call:
            for (std::uint32_t i = 0; i < n.rhs; ++i)
                stack.push_back(file.call_args[n.lhs + i]);
            break;
        case expr_kind::negate:
        case expr_kind::group:
            stack.push_back(n.lhs);
            break;
        case expr_kind::add:
        case expr_kind::subtract:
        case expr_kind::multiply:
        case expr_kind::divide:
        case expr_kind::compare:
            stack.push_back(n.lhs);
            stack.push_back(n.rhs);
            break;
        default:
            break;
        }
    }
    return false;
}

class solver {
  public:
    solver(const syntax::parsed_file& file, std::span<const input_role> roles, bool has_numbers)
        : file_(file), roles_(roles), has_numbers_(has_numbers) {}

    std::vector<input_requirement> found;

    // Nested deeper than any formula a person writes (a generated chain of 100,000 cells), the
    // input's requirement is not worked out, and the plain no-unit warning stands.
    static constexpr std::size_t deepest = 256;

    std::optional<affine> eval(std::uint32_t index) {
        if (depth_ >= deepest)
            return std::nullopt;
        ++depth_;
        struct leave {
            std::size_t& depth;
            ~leave() { --depth; }
        } const on_return{depth_};
        const syntax::expr_node& n = file_.nodes[index];
        switch (n.kind) {
        case expr_kind::number:
        case expr_kind::pi:
            return affine{};
        case expr_kind::negate:
        case expr_kind::group:
            return eval(n.lhs);
        case expr_kind::reference:
            return reference(n.lhs);
        case expr_kind::add:
        case expr_kind::subtract:
            return agree(eval(n.lhs), eval(n.rhs));
        case expr_kind::compare:
            static_cast<void>(agree(eval(n.lhs), eval(n.rhs)));
            return affine{};
        case expr_kind::multiply:
        case expr_kind::divide: {
            const auto a = eval(n.lhs);
            const auto b = eval(n.rhs);
            if (!a || !b)
                return std::nullopt;
            const bool divide = n.kind == expr_kind::divide;
            return affine{divide ? a->base / b->base : a->base * b->base,
                          divide ? a->k - b->k : a->k + b->k,
                          divide ? a->scale / b->scale : a->scale * b->scale};
        }
        case expr_kind::power:
            return power(eval(n.lhs), n.rhs);
        case expr_kind::call:
            return call(n);
        default:
            return std::nullopt;
        }
    }

    // The formula's value set against the unit written for its cell.
    void against(const std::optional<affine>& value, const syntax::reference_value& result) {
        if (value && result.dim)
            equate(*value, affine{*result.dim, 0, result.scale});
    }

  private:
    const syntax::parsed_file& file_;
    std::span<const input_role> roles_;
    bool has_numbers_;
    std::size_t depth_ = 0;

    std::optional<affine> reference(std::uint32_t r) {
        const syntax::reference_value& v = file_.references[r];
        const input_role role = r < roles_.size() ? roles_[r] : input_role::other;
        if (role == input_role::the_input)
            return affine{dimension{}, 1, 1.0};
        if (!v.dim)
            return std::nullopt;
        const affine typed{*v.dim, 0, v.scale};
        if (role == input_role::range_with_it)
            equate(affine{dimension{}, 1, 1.0}, typed);
        return typed;
    }

    // Where two values must agree: the input's dimension, if it enters them differently.
    void equate(const affine& a, const affine& b) {
        const rational k = a.k - b.k;
        if (k.is_zero())
            return; // agree or not whatever the input is: a finding of its own
        const rational inverse = rational(1) / k;
        input_requirement req{(b.base / a.base).pow(inverse), std::nullopt};
        if (!has_numbers_ && a.scale > 0 && b.scale > 0)
            req.scale = std::pow(b.scale / a.scale, inverse.to_double());
        found.push_back(req);
    }

    std::optional<affine> agree(const std::optional<affine>& a, const std::optional<affine>& b) {
        if (a && b) {
            equate(*a, *b);
            return a->k.is_zero() ? a : b;
        }
        return a ? a : b;
    }

    std::optional<affine> power(const std::optional<affine>& base, std::uint32_t exponent_node) {
        const std::optional<affine> e = eval(exponent_node);
        if (e)
            equate(*e, affine{}); // an exponent is a number
        const syntax::expr_node& x = file_.nodes[exponent_node];
        if (!base)
            return std::nullopt;
        std::optional<rational> p;
        if (x.kind == expr_kind::number && file_.source != nullptr)
            p = rational::parse(file_.source->text(x.range));
        if (!p)
            return base->k.is_zero() && base->base.is_dimensionless() ? base : std::nullopt;
        return affine{base->base.pow(*p), base->k * *p, std::pow(base->scale, p->to_double())};
    }

    std::optional<affine> call(const syntax::expr_node& n) {
        if (file_.source == nullptr)
            return std::nullopt;
        const std::string_view t = file_.source->text(n.range);
        const std::size_t begin = t.find_first_not_of("( \t\r\n");
        const std::size_t end = t.find('(', begin);
        if (begin == std::string_view::npos || end == std::string_view::npos)
            return std::nullopt;
        std::string_view name = t.substr(begin, end - begin);
        while (!name.empty() && (name.back() == ' ' || name.back() == '\t'))
            name.remove_suffix(1);
        const builtin_function* f = find_sheet_function(name);
        std::vector<std::optional<affine>> args;
        for (std::uint32_t i = 0; i < n.rhs; ++i)
            args.push_back(eval(file_.call_args[n.lhs + i]));
        if (f == nullptr || args.empty())
            return std::nullopt;
        switch (f->rule) {
        case function_rule::root:
            if (!args[0])
                return std::nullopt;
            return affine{args[0]->base.pow(f->power), args[0]->k * f->power,
                          std::pow(args[0]->scale, f->power.to_double())};
        case function_rule::same:
        case function_rule::keep_first:
            for (std::size_t i = 1; i < args.size(); ++i)
                if (args[i])
                    equate(*args[i], affine{});
            return args[0];
        case function_rule::dimensionless:
        case function_rule::log_base:
        case function_rule::to_radians:
        case function_rule::to_degrees:
            for (const auto& a : args)
                if (a)
                    equate(*a, affine{});
            return affine{};
        case function_rule::common:
        case function_rule::angle_of: {
            std::optional<affine> first;
            for (const auto& a : args)
                first = agree(first, a);
            return f->rule == function_rule::angle_of ? std::optional<affine>(affine{}) : first;
        }
        case function_rule::choice: {
            std::optional<affine> first;
            for (std::size_t i = 1; i < args.size(); ++i)
                first = agree(first, args[i]);
            return first;
        }
        case function_rule::product: {
            affine out;
            for (const auto& a : args) {
                if (!a)
                    return std::nullopt;
                out = {out.base * a->base, out.k + a->k, out.scale * a->scale};
            }
            return out;
        }
        case function_rule::count:
        case function_rule::logical:
        case function_rule::position:
            return affine{};
        default:
            return std::nullopt;
        }
    }
};

} // namespace

std::vector<input_requirement>
requirements_of_input(const syntax::parsed_file& file, std::uint32_t root,
                      std::span<const input_role> roles,
                      const std::optional<syntax::reference_value>& result) {
    solver s(file, roles, has_factor_numbers(file, root));
    try {
        const std::optional<affine> value = s.eval(root);
        if (result)
            s.against(value, *result);
    } catch (const arithmetic_overflow&) {
        return {};
    } catch (const std::domain_error&) {
        return {};
    }
    return std::move(s.found);
}

} // namespace plumb::sheets
