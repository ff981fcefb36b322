// The operand stack that every front end's parse actions use to build the flat expression
// tree: operands are pushed as they are read and combined when their operator completes.
#pragma once

#include "model/syntax_tree.hpp"

#include <cstdint>
#include <vector>

namespace plumb::syntax {

struct node_stack {
    std::vector<std::uint32_t> operands; // indices into the tree's nodes, innermost last

    // Inlined into every action, as a call cost more than the append itself; each push_back
    // grows out of line (issue 12: parse speed).
    [[gnu::always_inline]] std::uint32_t push(parsed_file& tree, expr_node n) {
        const auto index = static_cast<std::uint32_t>(tree.nodes.size());
        tree.nodes.push_back(n);
        operands.push_back(index);
        return index;
    }
    [[gnu::always_inline]] std::uint32_t pop() {
        const std::uint32_t v = operands.back();
        operands.pop_back();
        return v;
    }
    // The two operands on top become one node spanning both, which takes the place of the
    // left one on the stack: the stack only shrinks, so only the tree can need to grow.
    [[gnu::always_inline]] void push_binary(parsed_file& tree, expr_kind kind) {
        const std::size_t top = operands.size() - 1;
        const std::uint32_t lhs = operands[top - 1];
        const std::uint32_t rhs = operands[top];
        const auto index = static_cast<std::uint32_t>(tree.nodes.size());
        const span range{tree.nodes[lhs].range.begin, tree.nodes[rhs].range.end};
        tree.nodes.push_back({kind, range, lhs, rhs});
        operands[top - 1] = index;
        operands.pop_back();
    }
};

} // namespace plumb::syntax
