// Studies for people and for programs: matrix, repeating variables, groups, model plan.
#include "plumb/render.hpp"
#include "plumb/version.hpp"
#include "report/json_text.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace plumb {
namespace {

std::size_t display_width(std::string_view s) {
    std::size_t n = 0;
    for (const char c : s)
        if ((static_cast<unsigned char>(c) & 0xC0) != 0x80)
            ++n;
    return n;
}

std::string pad(std::string_view s, std::size_t width, bool right = false) {
    const std::size_t w = display_width(s);
    const std::string fill(w < width ? width - w : 0, ' ');
    return right ? fill + std::string(s) : std::string(s) + fill;
}

std::string describe(const dimension& d) {
    const std::string_view name = quantity_name(d);
    if (d.is_dimensionless())
        return "[1] (dimensionless)";
    return name.empty() ? d.to_string() : fmt::format("{} ({})", d.to_string(), name);
}

// The SI unit of a dimension written from base units: "kg m^-1 s^-2".
std::string si_unit(const dimension& d) {
    static constexpr std::array<std::string_view, base_dimension_count> units = {
        "kg", "m", "s", "K", "mol", "A", "cd"};
    std::string out;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = d.exponent(static_cast<base_dimension>(i));
        if (e.is_zero())
            continue;
        if (!out.empty())
            out += ' ';
        out += units[i];
        if (!(e == rational(1)))
            out += e.is_integer() ? fmt::format("^{}", e.to_string())
                                  : fmt::format("^({})", e.to_string());
    }
    return out.empty() ? "(dimensionless)" : out;
}

// Four significant figures at most and no float noise: "999", "1.643", and an exponent only
// where plain digits would mislead, written short as elsewhere in plumb: "1.2e6", "8.6e-7".
std::string number(double v) {
    std::string s = fmt::format("{:.4g}", v);
    const auto e = s.find('e');
    if (e == std::string::npos)
        return s;
    std::string exponent = s.substr(e + 1);
    const bool negative = !exponent.empty() && exponent.front() == '-';
    if (!exponent.empty() && (exponent.front() == '-' || exponent.front() == '+'))
        exponent.erase(0, 1);
    exponent.erase(0, std::min(exponent.find_first_not_of('0'), exponent.size() - 1));
    return s.substr(0, e + 1) + (negative ? "-" : "") + exponent;
}

// A variable's value in the unit the user gave or declared: "43.27 kN", "1.643 m/s".
std::string value_in_unit(double si, const study_report& s, std::size_t variable) {
    const group_variable& var = s.variables[variable];
    if (variable < s.units.size() && !s.units[variable].text.empty() &&
        s.units[variable].factor != 0.0) {
        const shown_unit& u = s.units[variable];
        return number((si - u.offset) / u.factor) + " " + u.text;
    }
    const std::string unit = var.dim.is_dimensionless() ? std::string() : si_unit(var.dim);
    return unit.empty() ? number(si) : number(si) + " " + unit;
}

void render_matrix(std::string& out, const study_report& s) {
    const auto& m = s.analysis.matrix;
    std::size_t width = 3;
    for (const auto& v : s.variables)
        width = std::max(width, display_width(v.name));
    for (std::size_t r = 0; r < m.values.rows(); ++r)
        for (std::size_t c = 0; c < m.values.cols(); ++c)
            width = std::max(width, m.values.at(r, c).to_string().size());
    out += "    " + std::string(4, ' ');
    for (const auto& v : s.variables)
        out += "  " + pad(v.name, width, true);
    out += '\n';
    for (std::size_t r = 0; r < m.values.rows(); ++r) {
        out += "    " + pad(base_dimension_symbol(m.rows[r]), 4);
        for (std::size_t c = 0; c < m.values.cols(); ++c)
            out += "  " + pad(m.values.at(r, c).to_string(), width, true);
        out += '\n';
    }
}

std::string group_label(const study_report& s, std::size_t g) {
    const pi_group& group = s.analysis.groups[g];
    // The name without its remarks: the groups list above gives them in full.
    const std::string_view name = std::string_view(group.name).substr(0, group.name.find(" ("));
    return fmt::format("π{} {}", g + 1, name.empty() ? std::string_view(group.formula) : name);
}

void render_plan(std::string& out, const study_report& s, const similitude_plan& plan) {
    std::string chosen;
    for (const std::size_t g : s.match)
        chosen += (chosen.empty() ? "" : ", ") + group_label(s, g);
    out += fmt::format("  model plan (scale {}{}; matched within {}%):\n",
                       s.length_scale ? fmt::format("1:{:.4g}", 1.0 / *s.length_scale)
                                      : std::string("not given: 1:1 assumed"),
                       chosen.empty() ? "" : ", matching " + chosen, number(s.tolerance * 100));
    std::size_t label_width = 0;
    for (const auto& g : plan.groups)
        label_width = std::max(label_width, display_width(group_label(s, g.group)));
    for (const auto& g : plan.groups) {
        std::string verdict = g.matched ? "matched" : g.model ? "off" : "-";
        if (g.matched && std::find(s.match.begin(), s.match.end(), g.group) != s.match.end())
            verdict = "matched (chosen)";
        out += fmt::format("    {}  prototype {:>10}  model {:>10}  {}\n",
                           pad(group_label(s, g.group), label_width),
                           g.prototype ? number(*g.prototype) : "-",
                           g.model ? number(*g.model) : "-", verdict);
    }
    std::size_t name_width = 0;
    for (const auto& v : plan.model)
        name_width = std::max(name_width, display_width(s.variables[v.variable].name));
    out += "    model values:\n";
    for (const auto& v : plan.model) {
        const auto& proto =
            s.prototype.size() > v.variable ? s.prototype[v.variable] : std::nullopt;
        out += fmt::format("      {} = {}   (prototype {}; {})\n",
                           pad(s.variables[v.variable].name, name_width),
                           v.value ? value_in_unit(*v.value, s, v.variable) : "?",
                           proto ? value_in_unit(*proto, s, v.variable) : "not given", v.how);
    }
    for (const auto& g : plan.groups)
        if (!g.scale_effect.empty())
            out +=
                fmt::format("    scale effect, {}: {}\n", group_label(s, g.group), g.scale_effect);
    for (const auto& c : plan.conflicts)
        out += fmt::format("    cannot match: {}\n", c.explanation);
    if (!plan.alternatives.empty()) {
        out += "    not every group can match with these model values; say which the model must "
               "match, as in 'match Froude' on the model line. The choices:\n";
        for (const auto& a : plan.alternatives) {
            std::string fixed;
            for (const auto& v : a.fixed)
                fixed += fmt::format("{}{} = {}", fixed.empty() ? "" : ", ",
                                     s.variables[v.variable].name,
                                     value_in_unit(*v.value, s, v.variable));
            out += fmt::format("      match {}: {}\n", group_label(s, a.group),
                               fixed.empty() ? std::string("fixes nothing further") : fixed);
            for (const auto& off : a.off)
                out += fmt::format("        {} off: {}\n", group_label(s, off.group),
                                   off.scale_effect);
        }
    }
    out += fmt::format("  caution: {}\n", similitude_caution());
}

} // namespace

std::string render_groups_text(const check_report& report, const text_style& /*style*/) {
    std::string out;
    for (const auto& s : report.studies) {
        const line_column at = s.where.file->position(s.where.range.begin);
        out += fmt::format("study {} ({}:{})\n", s.name, s.where.file->path(), at.line);
        for (const auto& v : s.variables)
            out += fmt::format("    {} {}\n", pad(v.name, 8), describe(v.dim));
        if (!s.analysis.problems.empty()) {
            for (const auto& p : s.analysis.problems)
                out += fmt::format("  cannot form groups: {}\n", p);
            out += '\n';
            continue;
        }
        out += "  dimension matrix:\n";
        render_matrix(out, s);
        out += fmt::format("  rank {}: {} variables give {} independent group{}\n", s.analysis.rank,
                           s.variables.size(), s.analysis.groups.size(),
                           s.analysis.groups.size() == 1 ? "" : "s");
        std::string repeating;
        for (std::size_t i : s.analysis.repeating)
            repeating += (repeating.empty() ? "" : ", ") + s.variables[i].name;
        out += fmt::format("  repeating variables: {} ({})\n", repeating,
                           s.analysis.repeating_chosen ? "chosen: never the dependent variable; a "
                                                         "density, a speed and a length first"
                                                       : "as given");
        std::size_t formula_width = 0;
        for (const auto& g : s.analysis.groups)
            formula_width = std::max(formula_width, display_width(g.formula));
        for (std::size_t i = 0; i < s.analysis.groups.size(); ++i) {
            const pi_group& g = s.analysis.groups[i];
            std::string remark = g.name;
            if (!g.recombined_from.empty())
                remark += fmt::format("{}recombined from {}", remark.empty() ? "" : "; ",
                                      g.recombined_from);
            if (g.has_dependent)
                remark += remark.empty() ? "holds the dependent variable"
                                         : "; holds the dependent variable";
            out += fmt::format("  π{} = {}  {}\n", i + 1, pad(g.formula, formula_width), remark);
        }
        for (const auto& note : s.analysis.notes)
            out += fmt::format("  note: {}\n", note);
        if (s.plan)
            render_plan(out, s, *s.plan);
        out += '\n';
    }
    if (report.studies.empty())
        out += "plumb: no study found; declare one as: study NAME: dependent depends on variable, "
               "variable, "
               "...\n";
    return out;
}

std::string render_groups_json(const check_report& report) {
    const auto str = [](std::string_view s) {
        std::string out;
        append_json_string(out, valid_utf8(s)); // a file or variable name may not be UTF-8
        return out;
    };
    const auto num = [](const std::optional<double>& v) {
        // Ten significant figures: far beyond any input, short of float noise.
        return v && std::isfinite(*v) ? fmt::format("{:.10g}", *v) : std::string("null");
    };
    std::string out = fmt::format(
        "{{\n  \"tool\": \"plumb\",\n  \"version\": \"{}\",\n  \"schema\": 1,\n  \"studies\": [",
        version());
    for (std::size_t k = 0; k < report.studies.size(); ++k) {
        const auto& s = report.studies[k];
        const line_column at = s.where.file->position(s.where.range.begin);
        out += fmt::format("{}\n    {{\"name\": {}, \"file\": {}, \"line\": {}, \"variables\": [",
                           k ? "," : "", str(s.name), str(s.where.file->path()), at.line);
        for (std::size_t i = 0; i < s.variables.size(); ++i)
            out += fmt::format("{}{{\"name\": {}, \"dimension\": {}}}", i ? ", " : "",
                               str(s.variables[i].name), str(s.variables[i].dim.to_string()));
        out += "],\n     \"problems\": [";
        for (std::size_t i = 0; i < s.analysis.problems.size(); ++i)
            out += (i ? ", " : "") + str(s.analysis.problems[i]);
        out += "], \"notes\": [";
        for (std::size_t i = 0; i < s.analysis.notes.size(); ++i)
            out += (i ? ", " : "") + str(s.analysis.notes[i]);
        out += fmt::format("], \"rank\": {}, \"repeating\": [", s.analysis.rank);
        for (std::size_t i = 0; i < s.analysis.repeating.size(); ++i)
            out += (i ? ", " : "") + str(s.variables[s.analysis.repeating[i]].name);
        out += fmt::format("], \"repeating_chosen\": {},\n     \"matrix\": {{\"rows\": [",
                           s.analysis.repeating_chosen ? "true" : "false");
        const auto& m = s.analysis.matrix;
        for (std::size_t r = 0; r < m.rows.size(); ++r)
            out += (r ? ", " : "") + str(base_dimension_symbol(m.rows[r]));
        out += "], \"values\": [";
        for (std::size_t r = 0; r < m.values.rows(); ++r) {
            out += r ? ", [" : "[";
            for (std::size_t c = 0; c < m.values.cols(); ++c)
                out += (c ? ", " : "") + str(m.values.at(r, c).to_string());
            out += "]";
        }
        out += "]},\n     \"groups\": [";
        for (std::size_t g = 0; g < s.analysis.groups.size(); ++g) {
            const auto& group = s.analysis.groups[g];
            out +=
                fmt::format("{}\n       {{\"formula\": {}, \"name\": {}, \"recombined_from\": {}, "
                            "\"has_dependent\": {}, \"exponents\": {{",
                            g ? "," : "", str(group.formula), str(group.name),
                            str(group.recombined_from), group.has_dependent ? "true" : "false");
            bool first = true;
            for (std::size_t i = 0; i < group.exponents.size(); ++i) {
                if (group.exponents[i].is_zero())
                    continue;
                out += fmt::format("{}{}: {}", first ? "" : ", ", str(s.variables[i].name),
                                   str(group.exponents[i].to_string()));
                first = false;
            }
            out += "}}";
        }
        out += "]";
        if (s.plan) {
            out += fmt::format(",\n     \"model\": {{\"length_scale\": {}, \"groups\": [",
                               num(s.length_scale));
            for (std::size_t i = 0; i < s.plan->groups.size(); ++i) {
                const auto& g = s.plan->groups[i];
                out += fmt::format("{}{{\"group\": {}, \"prototype\": {}, \"model\": {}, "
                                   "\"matched\": {}, \"ratio\": {}, \"scale_effect\": {}}}",
                                   i ? ", " : "", g.group + 1, num(g.prototype), num(g.model),
                                   g.matched ? "true" : "false", num(g.ratio), str(g.scale_effect));
            }
            out += "], \"variables\": [";
            for (std::size_t i = 0; i < s.plan->model.size(); ++i) {
                const auto& v = s.plan->model[i];
                const std::optional<double> proto =
                    s.prototype.size() > v.variable ? s.prototype[v.variable] : std::nullopt;
                // The unit the user declared or gave, and the values in it beside the SI ones;
                // coherent SI again where the user gave none.
                const shown_unit* shown = v.variable < s.units.size() &&
                                                  !s.units[v.variable].text.empty() &&
                                                  s.units[v.variable].factor != 0.0
                                              ? &s.units[v.variable]
                                              : nullptr;
                const auto in_unit = [&](const std::optional<double>& si) -> std::optional<double> {
                    if (!si || shown == nullptr)
                        return si;
                    return (*si - shown->offset) / shown->factor;
                };
                const std::string unit = shown != nullptr ? shown->text
                                         : s.variables[v.variable].dim.is_dimensionless()
                                             ? std::string()
                                             : si_unit(s.variables[v.variable].dim);
                out += fmt::format(
                    "{}{{\"name\": {}, \"model\": {}, \"prototype\": {}, \"si_unit\": {}, "
                    "\"unit\": {}, \"model_in_unit\": {}, \"prototype_in_unit\": {}, \"how\": "
                    "{}}}",
                    i ? ", " : "", str(s.variables[v.variable].name), num(v.value), num(proto),
                    str(si_unit(s.variables[v.variable].dim)), str(unit), num(in_unit(v.value)),
                    num(in_unit(proto)), str(v.how));
            }
            out += "], \"match\": [";
            for (std::size_t i = 0; i < s.match.size(); ++i)
                out += fmt::format("{}{}", i ? ", " : "", s.match[i] + 1);
            out += fmt::format("], \"tolerance\": {}, \"alternatives\": [", num(s.tolerance));
            for (std::size_t i = 0; i < s.plan->alternatives.size(); ++i) {
                const auto& a = s.plan->alternatives[i];
                out += fmt::format("{}{{\"match\": {}, \"fixes\": {{", i ? ", " : "", a.group + 1);
                for (std::size_t k = 0; k < a.fixed.size(); ++k)
                    out += fmt::format("{}{}: {}", k ? ", " : "",
                                       str(s.variables[a.fixed[k].variable].name),
                                       num(a.fixed[k].value));
                out += "}, \"off\": [";
                for (std::size_t k = 0; k < a.off.size(); ++k)
                    out += fmt::format("{}{{\"group\": {}, \"ratio\": {}, \"scale_effect\": {}}}",
                                       k ? ", " : "", a.off[k].group + 1, num(a.off[k].ratio),
                                       str(a.off[k].scale_effect));
                out += "]}";
            }
            out += "], \"conflicts\": [";
            for (std::size_t i = 0; i < s.plan->conflicts.size(); ++i)
                out += (i ? ", " : "") + str(s.plan->conflicts[i].explanation);
            out += fmt::format("], \"caution\": {}}}", str(similitude_caution()));
        }
        out += "}";
    }
    out += report.studies.empty() ? "],\n" : "\n  ],\n";
    out += fmt::format("  \"caution\": {}\n}}\n", str(caution_text()));
    return out;
}

} // namespace plumb
