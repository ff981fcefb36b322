// Studies: resolve variables, form groups, name them, plan the model.
#include "groups/studies.hpp"

#include "plumb/rules.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <unordered_set>

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

// Four significant figures at most, no float noise: "30", "12.5", "0.0123".
std::string readable_number(double v) {
    return fmt::format("{:.4g}", v);
}

std::string_view group_symbol(std::string_view symbol) {
    // Usual symbols of the numbers and coefficients: ISO 80000-11 for the characteristic
    // numbers; Carlton, Marine Propellers and Propulsion, for J, K_T and K_Q; common practice
    // for the coefficients.
    struct entry {
        std::string_view symbol;
        std::string_view name;
    };
    static constexpr entry symbols[] = {
        {"Re", "Reynolds number"},     {"Fr", "Froude number"},     {"We", "Weber number"},
        {"Ma", "Mach number"},         {"Eu", "Euler number"},      {"Sr", "Strouhal number"},
        {"Ca", "capillary number"},    {"Ga", "Galilei number"},    {"Gr", "Grashof number"},
        {"Ra", "Rayleigh number"},     {"Pr", "Prandtl number"},    {"Nu", "Nusselt number"},
        {"Bi", "Biot number"},         {"Fo", "Fourier number"},    {"Pe", "Péclet number"},
        {"Sh", "Sherwood number"},     {"Sc", "Schmidt number"},    {"Le", "Lewis number"},
        {"Kn", "Knudsen number"},      {"Ar", "Archimedes number"}, {"Cy", "Cauchy number"},
        {"St", "Stanton number"},      {"J", "advance ratio"},      {"K_T", "thrust coefficient"},
        {"K_Q", "torque coefficient"}, {"C_D", "drag coefficient"}, {"C_L", "lift coefficient"},
    };
    for (const entry& e : symbols)
        if (e.symbol == symbol)
            return e.name;
    return {};
}

bool word_in(std::string_view haystack, std::string_view word) {
    for (std::size_t at = haystack.find(word); at != std::string_view::npos;
         at = haystack.find(word, at + 1)) {
        const bool starts = at == 0 || haystack[at - 1] == ' ';
        const std::size_t end = at + word.size();
        const bool ends = end == haystack.size() || haystack[end] == ' ' || haystack[end] == ',';
        if (starts && ends)
            return true;
    }
    return false;
}

bool group_answers_to(const pi_group& group, std::size_t index, std::string_view wanted) {
    if (wanted == "π" + std::to_string(index + 1) || wanted == group.formula)
        return true;
    if (group.name.empty())
        return false;
    // The name up to its remarks: "Reynolds number (rotational, ρND²/μ)" answers to Reynolds.
    const std::string_view name =
        std::string_view(group.name).substr(0, std::string_view(group.name).find(" ("));
    const std::string_view by_symbol = group_symbol(wanted);
    if (!by_symbol.empty())
        return name.find(by_symbol) != std::string_view::npos;
    std::string lower(wanted);
    if (!lower.empty() && lower.front() >= 'a' && lower.front() <= 'z' &&
        word_in(name,
                std::string(1, static_cast<char>(lower.front() - 'a' + 'A')) + lower.substr(1)))
        return true;
    return word_in(name, wanted);
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
        std::unordered_set<std::string_view> listed;
        for (const span v : variable_spans) {
            const std::string_view name = text(v);
            if (listed.contains(name)) {
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
                // The declaration's own error is reported where it stands; this says why the
                // study stops, so `groups` does not just find no study.
                report(out_, rules::study_problem,
                       fmt::format("'{}' has no dimension plumb can use: its declaration has an "
                                   "error, so study '{}' cannot be worked out",
                                   name, r.name),
                       at(v));
                ok = false;
                continue;
            }
            listed.insert(name);
            r.variables.push_back({std::string(name), *entry->dim, entry->offset_unit != nullptr});
            shown_unit unit;
            if (!entry->unit_text.empty()) {
                unit.text = std::string(entry->unit_text);
                unit.factor = entry->si_factor;
                unit.offset = entry->offset_unit != nullptr ? entry->offset_unit->offset : 0.0;
            }
            r.units.push_back(std::move(unit));
        }
        if (!ok)
            return std::nullopt;

        group_request request;
        request.variables = r.variables;
        // Dependents are stored first; each gets a group of its own.
        for (std::uint32_t i = 0; i < s.dependent_count; ++i)
            request.dependents.push_back(i);
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
            apply_case(*it, c);
        }
        for (auto& r : reports) {
            if (r.prototype.empty() || !r.analysis.problems.empty())
                continue;
            check_model_lengths(r);
            similitude_request request;
            request.variables = r.variables;
            request.analysis = r.analysis;
            request.prototype = r.prototype;
            request.model = r.model;
            request.model.resize(r.variables.size());
            request.length_scale = r.length_scale.value_or(1.0);
            request.match = r.match;
            request.tolerance = r.tolerance;
            request.units = r.units;
            request.kinematic_viscosity_unit = declared_kinematic_viscosity_unit();
            r.plan = plan_model(request);
            for (const auto& problem : r.plan->problems)
                report(out_, rules::study_problem, problem, r.where);
        }
    }

  private:
    // The unit of a declared ν (or nu) with the dimension of a kinematic viscosity, if any.
    shown_unit declared_kinematic_viscosity_unit() {
        const dimension nu =
            dimension::base(base_dimension::length).pow(2) / dimension::base(base_dimension::time);
        for (const std::string_view name : {std::string_view("ν"), std::string_view("nu")}) {
            const symbol_entry* entry = symbols_.find(name);
            if (entry != nullptr && entry->dim && *entry->dim == nu && !entry->unit_text.empty() &&
                entry->offset_unit == nullptr)
                return {std::string(entry->unit_text), entry->si_factor, 0.0};
        }
        return {};
    }

    const syntax::parsed_file& file_;
    symbol_table& symbols_;
    std::vector<diagnostic>& out_;
    // Per study, where its model line gave the scale (for messages about lengths).
    std::vector<std::pair<std::string, span>> scale_at_;

    std::string_view text(span s) const { return file_.source->text(s); }
    location at(span s) const { return {file_.source, s}; }

    void apply_case(study_report& r, const syntax::study_case& c) {
        auto& values = c.model ? r.model : r.prototype;
        values.resize(r.variables.size());
        if (c.model && c.scale) {
            if (*c.scale <= 0) {
                report(out_, rules::study_problem, "the model scale must be positive",
                       at(c.scale_text));
            } else {
                r.length_scale = c.scale;
                scale_at_.emplace_back(r.name, c.scale_text);
            }
        }
        if (!c.model && c.scale)
            report(out_, rules::study_problem,
                   "a scale belongs on the model line, not the prototype line", at(c.scale_text));
        for (std::uint32_t i = 0; i < c.value_count; ++i)
            apply_value(r, values, file_.case_values[c.first_value + i], c.model);
        if (c.match_count > 0 && !c.model)
            report(out_, rules::study_problem,
                   "what the model must match belongs on the model line, not the prototype line",
                   at(file_.case_matches[c.first_match]));
        if (c.model) {
            for (std::uint32_t i = 0; i < c.match_count; ++i)
                resolve_match(r, file_.case_matches[c.first_match + i]);
            if (c.tolerance) {
                if (*c.tolerance > 0 && *c.tolerance < 1)
                    r.tolerance = *c.tolerance;
                else
                    report(out_, rules::study_problem,
                           "the tolerance must be more than 0 % and less than 100 %",
                           at(c.tolerance_text));
            }
        }
    }

    // A group named on the model line: by its π label, its formula, the name of the number
    // (a word of it is enough: "Froude"), or the number's usual symbol.
    void resolve_match(study_report& r, span target) {
        const std::string_view wanted = text(target);
        const auto& groups = r.analysis.groups;
        std::vector<std::size_t> found;
        for (std::size_t g = 0; g < groups.size(); ++g)
            if (group_answers_to(groups[g], g, wanted))
                found.push_back(g);
        if (found.empty()) {
            diagnostic& d = report(out_, rules::study_problem,
                                   fmt::format("'{}' names no group of study '{}'", wanted, r.name),
                                   at(target));
            std::string list;
            for (std::size_t g = 0; g < groups.size(); ++g)
                list += fmt::format("{}π{} = {}{}", g ? "; " : "", g + 1, groups[g].formula,
                                    groups[g].name.empty() ? "" : " (" + groups[g].name + ")");
            d.notes.push_back({"its groups are: " + list, {}});
            return;
        }
        for (const std::size_t g : found) {
            if (groups[g].has_dependent) {
                report(out_, rules::study_problem,
                       fmt::format("{} holds a dependent variable: it is what the model measures, "
                                   "so it cannot be chosen to match",
                                   groups[g].formula),
                       at(target));
                continue;
            }
            if (std::find(r.match.begin(), r.match.end(), g) == r.match.end())
                r.match.push_back(g);
        }
    }

    // A model line that gives a length as well as the scale must agree with it.
    void check_model_lengths(study_report& r) {
        if (r.model.empty())
            return;
        const auto scale_text = std::find_if(scale_at_.begin(), scale_at_.end(),
                                             [&](const auto& p) { return p.first == r.name; });
        for (std::size_t j = 0; j < r.variables.size(); ++j) {
            if (!(r.variables[j].dim == dimension::base(base_dimension::length)) || !r.model[j] ||
                j >= r.prototype.size() || !r.prototype[j] || *r.prototype[j] == 0)
                continue;
            const double ratio = *r.model[j] / *r.prototype[j];
            if (!r.length_scale) {
                r.length_scale = ratio; // the lengths say what the scale is
                continue;
            }
            if (std::fabs(ratio / *r.length_scale - 1.0) <= r.tolerance)
                continue;
            const std::string& name = r.variables[j].name;
            report(out_, rules::study_problem,
                   fmt::format("the model's {} is 1:{} of the prototype's, but the model line "
                               "says scale = {}; correct the length or the scale",
                               name, readable_number(1.0 / ratio),
                               scale_text != scale_at_.end() ? text(scale_text->second)
                                                             : std::string_view("?")),
                   r.where);
        }
    }

    void apply_value(study_report& r, std::vector<std::optional<double>>& values,
                     const syntax::case_value& v, bool model) {
        const std::string_view name = text(v.name);
        const auto it = std::find_if(r.variables.begin(), r.variables.end(),
                                     [&](const group_variable& g) { return g.name == name; });
        if (it == r.variables.end()) {
            report(out_, rules::study_problem,
                   fmt::format("'{}' is not a variable of study '{}'", name, r.name), at(v.name));
            return;
        }
        if (!v.dim) {
            // The unknown unit is reported where it stands; the value must not vanish quietly.
            report(out_, rules::study_problem,
                   fmt::format("the value of '{}' is left out of study '{}': its unit is not known",
                               name, r.name),
                   at(v.value));
            return;
        }
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
        const auto j = static_cast<std::size_t>(it - r.variables.begin());
        values[j] = v.si_value;
        // Values are shown in the unit the prototype line gives, else the declared one.
        if (v.has_unit && (!model || r.units[j].text.empty()))
            r.units[j] = {std::string(text(v.unit)), v.unit_factor, v.unit_offset};
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
