// Searches that look at every node below a root of the syntax tree. Iterative, so that a
// formula of a million terms cannot overflow the stack.
#pragma once

#include "model/syntax_tree.hpp"

#include <cstdint>
#include <utility>
#include <vector>

namespace plumb::syntax {

// What a search does at a node it has looked at.
enum class search_step : std::uint8_t {
    found,   // stop: the node is what the search looks for
    descend, // look at its operands: both of '+', '-', '*' and '/', the inner term of a group
             // or a sign, a power's base, a call's arguments
    skip,    // look no further below it
};

// The node inside any brackets written around it.
inline std::uint32_t inside_brackets(const parsed_file& file, std::uint32_t k) {
    while (file.nodes[k].kind == expr_kind::group)
        k = file.nodes[k].lhs;
    return k;
}

// Asks `at_node(index, node)` at each node below the roots, depth first, until it answers
// found. A power's exponent is never searched: it is a pure number, whatever it holds, and
// no search here looks for one (the callers that read exponents do so at the power itself).
template <class AtNode>
bool search_nodes(const parsed_file& file, std::vector<std::uint32_t> pending, AtNode&& at_node) {
    while (!pending.empty()) {
        const std::uint32_t at = pending.back();
        pending.pop_back();
        const expr_node& n = file.nodes[at];
        const search_step step = at_node(at, n);
        if (step == search_step::found)
            return true;
        if (step == search_step::skip)
            continue;
        switch (n.kind) {
        case expr_kind::add:
        case expr_kind::subtract:
        case expr_kind::multiply:
        case expr_kind::divide:
            pending.push_back(n.lhs);
            pending.push_back(n.rhs);
            break;
        case expr_kind::group:
        case expr_kind::negate:
        case expr_kind::power:
            pending.push_back(n.lhs);
            break;
        case expr_kind::call:
            for (std::uint32_t a = 0; a < n.rhs; ++a)
                pending.push_back(file.call_args[n.lhs + a]);
            break;
        default:
            break;
        }
    }
    return false;
}

template <class AtNode>
bool search_subtree(const parsed_file& file, std::uint32_t root, AtNode&& at_node) {
    return search_nodes(file, {root}, std::forward<AtNode>(at_node));
}

// Every side of a formula.
template <class AtNode>
bool search_formula(const parsed_file& file, const formula& f, AtNode&& at_node) {
    std::vector<std::uint32_t> roots;
    roots.reserve(f.side_count);
    for (std::uint32_t i = 0; i < f.side_count; ++i)
        roots.push_back(file.sides[f.first_side + i].root);
    return search_nodes(file, std::move(roots), std::forward<AtNode>(at_node));
}

} // namespace plumb::syntax
