// From `study`, `prototype` and `model` lines to group analyses and model plans.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"
#include "plumb/check.hpp"

#include <vector>

namespace plumb {

// Resolves each study's variables in `symbols`, forms its groups, and plans the model when
// the file gives prototype values. Problems become diagnostics in `out`.
void work_out_studies(const syntax::parsed_file& file, symbol_table& symbols,
                      std::vector<diagnostic>& out, std::vector<study_report>& reports);

} // namespace plumb
