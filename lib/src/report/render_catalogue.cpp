// The built-in units for people: grouped by the quantity each measures, with the exact factor
// to the coherent SI unit, the origin of interval and gauge scales, and the source of each.
#include "plumb/render.hpp"
#include "plumb/unit_table.hpp"

#include "report/display_line.hpp"
#include "report/exact_decimal.hpp"
#include "report/palette.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <vector>

namespace plumb {
namespace {

constexpr std::string_view prefix_source = "SI Brochure 9th ed., Table 7";

// One unit, with every spelling the table accepts for it ("°C, degC, ℃").
struct entry {
    std::vector<std::string> symbols;
    std::string name;
    const unit_definition* row = nullptr;
    std::string factor; // already written out
    std::string source;
};

struct group {
    dimension dim;
    std::vector<entry> entries;
};

std::string lower(std::string_view text) {
    std::string out(text);
    for (char& c : out)
        if (c >= 'A' && c <= 'Z')
            c = static_cast<char>(c - 'A' + 'a');
    return out;
}

bool mentions(std::string_view haystack, std::string_view filter) {
    return lower(haystack).find(lower(filter)) != std::string::npos;
}

// π has no exact decimal or fraction; the table writes it "pi". A measured value in powers of
// ten keeps its published digits, trailing zeros included.
std::string factor_of(const unit_definition& u) {
    const std::string_view text_factor = u.exact_factor;
    if (const std::size_t e = text_factor.find_first_of("eE");
        e != std::string_view::npos && read_exact(text_factor))
        return fmt::format("{} \u00D7 10^{}", text_factor.substr(0, e),
                           read_exact(text_factor)->power_of_ten);
    if (const auto n = read_exact(u.exact_factor))
        return decimal_text(*n);
    std::string text(u.exact_factor);
    if (const std::size_t pi = text.find("pi"); pi != std::string::npos)
        text.replace(pi, 2, "\u03C0");
    return text;
}

bool spelling_of(const entry& e, const unit_definition& u) {
    return e.name == u.name && e.row->exact_factor == u.exact_factor && e.row->scale == u.scale &&
           e.row->dim() == u.dim();
}

// The coherent SI unit of a dimension: the table's SI unit of factor 1 when there is one
// (Pa, J), else the base units with their powers.
std::string coherent_unit(const dimension& dim) {
    if (dim.is_dimensionless())
        return "1";
    for (const auto& u : unit_table::standard().units())
        if (u.exact_factor == "1" && u.scale == unit_scale::absolute &&
            u.source.rfind("SI Brochure", 0) == 0 && u.dim() == dim)
            return std::string(u.symbol);
    constexpr std::string_view base_units[] = {"kg", "m", "s", "K", "mol", "A", "cd"};
    std::string out;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = dim.exponents()[i];
        if (e.is_zero())
            continue;
        if (!out.empty())
            out += ' ';
        out += base_units[i];
        if (!(e == rational(1)))
            out += e.is_integer() ? "^" + e.to_string() : "^(" + e.to_string() + ")";
    }
    return out;
}

// The SI value of the scale's zero, exactly. Table offsets are short decimals either in SI
// (101325 Pa, 273.15 K) or in the unit's own degrees (459.67 °F below absolute zero), so the
// shorter of the two readings is the defining one; it must reproduce the stored value.
std::string origin_of(const unit_definition& u, std::string_view si_unit) {
    if (u.scale == unit_scale::absolute)
        return {};
    const auto factor = read_exact(u.exact_factor);
    const std::string in_si = fmt::format("{:.10g}", u.offset);
    const std::string in_unit = fmt::format("{:.10g}", u.offset / u.factor);
    std::optional<exact_number> zero;
    if (in_unit.size() < in_si.size() && factor && factor->power_of_ten == 0) {
        if (const auto degrees = rational::parse(in_unit))
            zero = exact_number{*degrees * factor->mantissa, 0};
    } else {
        zero = read_exact(in_si);
    }
    const bool faithful =
        zero && std::abs(zero->mantissa.to_double() - u.offset) <= 1e-9 * std::abs(u.offset);
    const std::string value = faithful ? decimal_text(*zero) : "\u2248 " + in_si;
    return fmt::format("zero at {} {}", value, si_unit);
}

struct columns {
    std::uint32_t symbols = 0, name = 0, factor = 0, remark = 0;
};

std::string joined(const std::vector<std::string>& symbols) {
    std::string out;
    for (const auto& s : symbols)
        out += (out.empty() ? "" : ", ") + s;
    return out;
}

std::string remark_of(const entry& e, std::string_view si_unit) {
    if (e.row->scale != unit_scale::absolute)
        return origin_of(*e.row, si_unit);
    // A resolved prefixed unit ("kilo + pascal") takes no second prefix.
    return e.row->takes_prefixes && e.name == e.row->name ? "takes SI prefixes" : "";
}

std::string prefix_table(const palette::painter& paint) {
    std::string out = fmt::format(
        "\n{} {}\n", paint(palette::strong, "SI prefixes"),
        paint(palette::rule, fmt::format("({}; ronna, quetta, ronto, quecto since 2022); "
                                         "\u00B5 may also be written \u03BC or u",
                                         prefix_source)));
    const auto prefixes = unit_table::standard().prefixes();
    constexpr std::size_t per_line = 4;
    for (std::size_t i = 0; i < prefixes.size(); ++i) {
        const unit_prefix& p = prefixes[i];
        const std::string symbol =
            std::string(p.symbol) + std::string(3 - std::min(2u, cell_count(p.symbol)), ' ');
        std::string cell = fmt::format("{}{:<8}10^{:<6}", symbol, p.name, p.power_of_ten);
        const bool ends_line = i % per_line + 1 == per_line || i + 1 == prefixes.size();
        if (ends_line)
            cell.erase(cell.find_last_not_of(' ') + 1);
        out += "  " + cell + (ends_line ? "\n" : "");
    }
    return out;
}

} // namespace

std::string render_catalogue(std::string_view filter, const text_style& style) {
    const palette::painter paint{style.colour};
    const unit_table& table = unit_table::standard();

    std::vector<group> groups;
    for (const auto& u : table.units()) {
        const dimension dim = u.dim();
        auto g = std::find_if(groups.begin(), groups.end(),
                              [&](const group& x) { return x.dim == dim; });
        if (g == groups.end()) {
            groups.push_back({dim, {}});
            g = groups.end() - 1;
        }
        auto same = std::find_if(g->entries.begin(), g->entries.end(),
                                 [&](const entry& e) { return spelling_of(e, u); });
        if (same != g->entries.end()) {
            same->symbols.emplace_back(u.symbol);
            continue;
        }
        g->entries.push_back({{std::string(u.symbol)},
                              std::string(u.name),
                              &u,
                              factor_of(u),
                              std::string(u.source)});
    }

    if (!filter.empty()) {
        for (auto& g : groups) {
            if (mentions(quantity_name(g.dim), filter))
                continue; // the whole quantity was asked for
            std::erase_if(g.entries, [&](const entry& e) {
                const bool by_symbol =
                    std::any_of(e.symbols.begin(), e.symbols.end(), [&](const std::string& s) {
                        return s.find(filter) != std::string::npos;
                    });
                return !by_symbol && !mentions(e.name, filter);
            });
        }
        std::erase_if(groups, [](const group& g) { return g.entries.empty(); });
        // A prefixed unit is no row of its own: show what it resolves to, also when other
        // rows merely contain its text ("kPa" in "kPag").
        const bool exact_row = std::any_of(groups.begin(), groups.end(), [&](const group& g) {
            return std::any_of(g.entries.begin(), g.entries.end(), [&](const entry& e) {
                return std::find(e.symbols.begin(), e.symbols.end(), filter) != e.symbols.end();
            });
        });
        if (!exact_row)
            if (const auto r = table.resolve(filter); r && r->prefix != nullptr) {
                const auto unit = read_exact(r->unit->exact_factor);
                entry e{{std::string(filter)},
                        fmt::format("{} + {}", r->prefix->name, r->unit->name),
                        r->unit,
                        unit ? decimal_text(
                                   {unit->mantissa, unit->power_of_ten + r->prefix->power_of_ten})
                             : fmt::format("10^{} \u00D7 {}", r->prefix->power_of_ten,
                                           factor_of(*r->unit)),
                        fmt::format("{}; prefix: {}", r->unit->source, prefix_source)};
                const auto same = std::find_if(groups.begin(), groups.end(),
                                               [&](const group& g) { return g.dim == r->dim(); });
                if (same != groups.end())
                    same->entries.insert(same->entries.begin(), std::move(e));
                else
                    groups.push_back({r->dim(), {std::move(e)}});
            }
    }
    const bool prefixes_too =
        filter.empty() ||
        std::any_of(table.prefixes().begin(), table.prefixes().end(),
                    [&](const unit_prefix& p) { return p.name == lower(filter); });
    if (groups.empty() && !prefixes_too)
        return {};

    const auto pad = [](std::string text, std::uint32_t cells) {
        const std::uint32_t have = cell_count(text);
        return have < cells ? text + std::string(cells - have, ' ') : text;
    };

    std::string out;
    if (!groups.empty())
        out += "Factor: the value of one unit in the coherent SI unit of its heading. A decimal\n"
               "that does not end is cut short with \u2026 and followed by its exact fraction.\n";
    for (const auto& g : groups) {
        const std::string si = coherent_unit(g.dim);
        // Columns line up within a quantity; one long fraction does not widen every group.
        columns width;
        for (const auto& e : g.entries) {
            width.symbols = std::max(width.symbols, cell_count(joined(e.symbols)));
            width.name = std::max(width.name, cell_count(e.name));
            width.factor = std::max(width.factor, cell_count(e.factor));
            width.remark = std::max(width.remark, cell_count(remark_of(e, si)));
        }
        const std::string_view quantity = quantity_name(g.dim);
        out += fmt::format("\n{} {}  {}\n",
                           paint(palette::strong, quantity.empty() ? "(no common name)" : quantity),
                           g.dim.to_string(), paint(palette::note, "SI: " + si));
        for (const auto& e : g.entries) {
            std::string row = fmt::format("  {}  {}  {}  ", pad(joined(e.symbols), width.symbols),
                                          pad(e.name, width.name), pad(e.factor, width.factor));
            if (width.remark > 0)
                row += pad(remark_of(e, si), width.remark) + "  ";
            row += paint(palette::rule, e.source);
            out += row + "\n";
        }
    }
    if (prefixes_too)
        out += prefix_table(paint);
    return out;
}

} // namespace plumb
