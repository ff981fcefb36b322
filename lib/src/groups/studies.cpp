// Studies: resolve variables, form groups, name them, plan the model.
#include "groups/studies.hpp"

#include "plumb/rules.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace plumb {
namespace {

diagnostic& report(std::vector<diagnostic>& out, std::string_view rule, std::string message,
                   location where, severity level = severity::error) {
    diagnostic d;
    d.level = level;
    d.rule = std::string(rule);
    d.message = std::move(message);
    d.where = where;
    out.push_back(std::move(d));
    return out.back();
}

std::string describe(const dimension& d) {
    const std::string_view name = quantity_name(d);
    return name.empty() ? d.to_string() : fmt::format("{} ({})", d.to_string(), name);
}

class study_worker {
  public:
    study_worker(const syntax::parsed_file& file, symbol_table& symbols,
                 std::vector<diagnostic>& out)
        : file_(file), symbols_(symbols), out_(out) {}

    std::optional<study_report> work(const syntax::study& s) {
        study_report r;
        r.where = at(s.range);
        r.name = std::string(text(s.name));
        std::vector<span> variable_spans;
        for (std::uint32_t i = 0; i < s.dependent_count + s.variable_count; ++i)
            variable_spans.push_back(file_.study_names[s.first_variable + i]);

        bool ok = true;
        for (const span v : variable_spans) {
            const std::string_view name = text(v);
            const auto same = std::find_if(r.variables.begin(), r.variables.end(),
                                           [&](const group_variable& g) { return g.name == name; });
            if (same != r.variables.end()) {
                report(out_, rules::study_problem,
                       fmt::format("'{}' is listed twice in study '{}'", name, r.name), at(v));
                ok = false;
                continue;
            }
            symbol_entry* entry = symbols_.find(name);
            if (entry == nullptr) {
                diagnostic& d = report(out_, rules::undeclared,
                                       fmt::format("'{}' is not declared", name), at(v));
                d.mark_label = "not declared";
                d.notes.push_back({"a study's variables are declared like any symbol, with their "
                                   "dimension or unit",
                                   {}});
                ok = false;
                continue;
            }
            entry->used = true;
            if (!entry->dim) {
                ok = false;
                continue;
            }
            r.variables.push_back({std::string(name), *entry->dim});
        }
        if (!ok)
            return std::nullopt;

        group_request request;
        request.variables = r.variables;
        if (s.dependent_count > 1) {
            report(out_, rules::study_problem,
                   fmt::format("study '{}' names {} dependent variables; the groups are formed for "
                               "one dependent variable at a time: write one study for each",
                               r.name, s.dependent_count),
                   at(s.range));
            return std::nullopt;
        }
        if (s.dependent_count == 1)
            request.dependent = 0;
        for (std::uint32_t i = 0; i < s.repeating_count; ++i) {
            const span v =
                file_.study_names[s.first_variable + s.dependent_count + s.variable_count + i];
            const auto it =
                std::find_if(r.variables.begin(), r.variables.end(),
                             [&](const group_variable& g) { return g.name == text(v); });
            if (it == r.variables.end()) {
                report(out_, rules::study_problem,
                       fmt::format("repeating variable '{}' is not one of the study's variables",
                                   text(v)),
                       at(v));
                return std::nullopt;
            }
            request.repeating.push_back(static_cast<std::size_t>(it - r.variables.begin()));
        }
        r.analysis = analyse_groups(request);
        for (const auto& problem : r.analysis.problems)
            report(out_, rules::study_problem, problem, r.where);
        if (r.analysis.problems.empty())
            name_groups(r.analysis, r.variables);
        return r;
    }

    // Prototype and model lines fill the study's values; a prototype line asks for a plan.
    void apply_cases(std::vector<study_report>& reports) {
        for (const auto& c : file_.cases) {
            const std::string_view study = text(c.study);
            auto it = std::find_if(reports.begin(), reports.end(),
                                   [&](const study_report& r) { return r.name == study; });
            if (it == reports.end()) {
                report(out_, rules::study_problem,
                       fmt::format("there is no study '{}' in this file", study), at(c.study));
                continue;
            }
            study_report& r = *it;
            auto& values = c.model ? r.model : r.prototype;
            values.resize(r.variables.size());
            if (c.model && c.scale) {
                if (*c.scale <= 0)
                    report(out_, rules::study_problem, "the model scale must be positive",
                           at(c.scale_text));
                else
                    r.length_scale = c.scale;
            }
            if (!c.model && c.scale)
                report(out_, rules::study_problem,
                       "a scale belongs on the model line, not the prototype line",
                       at(c.scale_text));
            for (std::uint32_t i = 0; i < c.value_count; ++i)
                apply_value(r, values, file_.case_values[c.first_value + i]);
        }
        for (auto& r : reports) {
            if (r.prototype.empty() || !r.analysis.problems.empty())
                continue;
            similitude_request request;
            request.variables = r.variables;
            request.analysis = r.analysis;
            request.prototype = r.prototype;
            request.model = r.model;
            request.model.resize(r.variables.size());
            request.length_scale = r.length_scale.value_or(1.0);
            r.plan = plan_model(request);
            for (const auto& problem : r.plan->problems)
                report(out_, rules::study_problem, problem, r.where);
        }
    }

  private:
    const syntax::parsed_file& file_;
    symbol_table& symbols_;
    std::vector<diagnostic>& out_;

    std::string_view text(span s) const { return file_.source->text(s); }
    location at(span s) const { return {file_.source, s}; }

    void apply_value(study_report& r, std::vector<std::optional<double>>& values,
                     const syntax::case_value& v) {
        const std::string_view name = text(v.name);
        const auto it = std::find_if(r.variables.begin(), r.variables.end(),
                                     [&](const group_variable& g) { return g.name == name; });
        if (it == r.variables.end()) {
            report(out_, rules::study_problem,
                   fmt::format("'{}' is not a variable of study '{}'", name, r.name), at(v.name));
            return;
        }
        if (!v.dim)
            return; // its unit was unknown; reported already
        if (!(*v.dim == it->dim)) {
            diagnostic& d = report(
                out_, rules::value_mismatch,
                v.has_unit ? fmt::format("the unit of this value does not fit '{}'", name)
                           : fmt::format("'{}' has a dimension, so its value needs a unit", name),
                at(v.value));
            d.notes.push_back({fmt::format("'{}' is {}", name, describe(it->dim)), {}});
            if (v.has_unit)
                d.notes.push_back({fmt::format("the value's unit is {}", describe(*v.dim)), {}});
            return;
        }
        values[static_cast<std::size_t>(it - r.variables.begin())] = v.si_value;
    }
};

} // namespace

void work_out_studies(const syntax::parsed_file& file, symbol_table& symbols,
                      std::vector<diagnostic>& out, std::vector<study_report>& reports) {
    if (file.studies.empty() && file.cases.empty())
        return;
    study_worker worker(file, symbols, out);
    std::vector<study_report> mine;
    for (const auto& s : file.studies) {
        const std::string_view name = file.source->text(s.name);
        if (std::any_of(mine.begin(), mine.end(),
                        [&](const study_report& r) { return r.name == name; })) {
            report(out, rules::study_problem,
                   fmt::format("a study named '{}' already exists in this file", name),
                   {file.source, s.name});
            continue;
        }
        if (auto r = worker.work(s))
            mine.push_back(std::move(*r));
    }
    worker.apply_cases(mine);
    for (auto& r : mine)
        reports.push_back(std::move(r));
}

} // namespace plumb
