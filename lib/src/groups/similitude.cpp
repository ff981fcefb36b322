// Scale-model planning: the model value of every variable that makes the chosen dimensionless
// groups of the model equal those of the prototype; every other group judged against the
// prototype; and, where no choice was made and not all groups can match, the alternatives.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {
namespace {

constexpr std::string_view caution_text =
    "Model tests are seldom fully similar: partial similarity and scale effects apply, so "
    "model results must be interpreted with care, and model testing must follow the "
    "applicable codes of practice.";

} // namespace

std::string planner::label(std::size_t g) const {
    const pi_group& group = r_.analysis.groups[g];
    if (!group.name.empty())
        return "the " + group.name;
    if (!group.formula.empty())
        return group.formula;
    return "π" + std::to_string(g + 1);
}

std::string planner::labels(const std::vector<std::size_t>& gs) const {
    std::vector<std::string> parts;
    parts.reserve(gs.size());
    for (const std::size_t g : gs)
        parts.push_back(label(g));
    return join(parts, " and ");
}

std::vector<std::size_t> planner::groups_with(std::size_t variable) const {
    std::vector<std::size_t> out;
    for (std::size_t g = 0; g < r_.analysis.groups.size(); ++g)
        if (group_ok_[g] && !exponents(g)[variable].is_zero())
            out.push_back(g);
    return out;
}

similitude_plan planner::run() {
    validate_inputs();
    const std::size_t count = r_.analysis.groups.size();
    const bool scale_ok = std::isfinite(r_.length_scale) && r_.length_scale > 0.0;
    if (!r_.analysis.problems.empty() || !scale_ok) {
        for (std::size_t g = 0; g < count; ++g) {
            group_values gv;
            gv.group = g;
            if (group_proto_[g])
                gv.prototype = group_proto_[g]->value();
            plan_.groups.push_back(gv);
        }
        return std::move(plan_);
    }

    assign_known_model_values();
    resolved_.assign(count, false);
    if (!choice_.match.empty())
        solve(true, false);
    if (choice_.others_may_fix)
        solve(false, false);
    solve(!choice_.others_may_fix, true);

    for (std::size_t g = 0; g < count; ++g)
        plan_.groups.push_back(judge(g));
    report_unrepresentable_groups();
    for (std::size_t j = 0; j < model_.size(); ++j) {
        const model_state& m = model_[j];
        model_variable mv;
        mv.variable = j;
        if (m.value)
            mv.value = m.value->value();
        switch (m.from) {
        case origin::given:
            mv.how = "given";
            break;
        case origin::scaled:
            mv.how = "scaled by the length scale";
            break;
        case origin::gravity:
            mv.how = "same as the prototype (gravity)";
            break;
        case origin::solved:
            mv.how = "from " + labels(m.fixed_by) + (m.fixed_by.size() > 1 ? " together" : "");
            break;
        case origin::no_value:
            mv.how = "no model value: " + labels(m.fixed_by) +
                     (m.fixed_by.size() > 1 ? " give" : " gives") + " none that is real and finite";
            break;
        case origin::unknown:
            mv.how = choice_.others_may_fix ? "free: no group fixes it"
                                            : "depends on the group chosen to match";
            break;
        }
        plan_.model.push_back(std::move(mv));
    }
    return std::move(plan_);
}

bool planner::chosen(std::size_t g) const {
    return std::find(choice_.match.begin(), choice_.match.end(), g) != choice_.match.end();
}

const shown_unit* planner::unit_of(std::size_t j) const {
    return j < r_.units.size() ? &r_.units[j] : nullptr;
}

namespace {

// Without a choice, when groups conflict: the plan fixes only what every choice agrees on, and
// each contested group becomes an alternative (match it, and these are off by so much).
similitude_plan plan_with_alternatives(const similitude_request& request, similitude_plan full) {
    const auto& groups = request.analysis.groups;
    std::vector<std::size_t> contested;
    for (const auto& c : full.conflicts)
        for (const std::size_t g : c.groups)
            if (g < groups.size() && !groups[g].has_dependent &&
                std::find(contested.begin(), contested.end(), g) == contested.end())
                contested.push_back(g);
    std::sort(contested.begin(), contested.end());
    if (contested.empty())
        return full; // only given values disagree: there is nothing to choose
    std::vector<std::size_t> agreed;
    for (std::size_t g = 0; g < groups.size(); ++g)
        if (!groups[g].has_dependent &&
            std::find(contested.begin(), contested.end(), g) == contested.end())
            agreed.push_back(g);

    similitude_plan shared = planner(request, {agreed, false, false}).run();
    shared.conflicts = full.conflicts;
    for (const std::size_t g : contested) {
        const similitude_plan one = planner(request, {{g}, true, true}).run();
        plan_alternative alternative;
        alternative.group = g;
        for (const auto& v : one.model)
            if (v.variable < shared.model.size() && !shared.model[v.variable].value && v.value)
                alternative.fixed.push_back(v);
        bool itself_off = false;
        for (const auto& gv : one.groups) {
            if (!gv.matched && gv.ratio)
                alternative.off.push_back(gv);
            itself_off = itself_off || (gv.group == g && !gv.matched);
        }
        // A group that stays off even when chosen (every variable in it is given) is no
        // choice: "match it" would fix nothing and leave it off. The conflict says what it needs.
        if (!itself_off)
            shared.alternatives.push_back(std::move(alternative));
    }
    if (shared.alternatives.empty())
        return full; // nothing to choose between: the plan as solved, with its conflicts
    return shared;
}

} // namespace

} // namespace plumb::planning

namespace plumb {

similitude_plan plan_model(const similitude_request& request) {
    if (!request.match.empty())
        return planning::planner(request, {request.match, true, true}).run();
    similitude_plan full = planning::planner(request, {{}, true, false}).run();
    if (full.conflicts.empty())
        return full;
    return planning::plan_with_alternatives(request, std::move(full));
}

std::string_view similitude_caution() {
    return planning::caution_text;
}

} // namespace plumb
