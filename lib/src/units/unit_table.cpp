// Lookup over the built-in unit rows: exact symbols, SI prefixes, and "did you mean".
#include "plumb/unit_table.hpp"

#include "units/exact_factor.hpp"

#include <algorithm>
#include <atomic>
#include <cctype>
#include <cstdint>
#include <cstdlib>
#include <functional>
#include <memory>
#include <tuple>
#include <unordered_map>

namespace plumb {

namespace detail {
// Defined in unit_table_data.cpp.
std::span<const unit_definition> builtin_units();
std::span<const unit_prefix> builtin_prefixes();
} // namespace detail

struct unit_table::index {
    struct prefix_spelling {
        std::string_view text;
        const unit_prefix* prefix;
    };

    std::span<const unit_definition> units;
    std::span<const unit_prefix> prefixes;
    std::unordered_map<std::string_view, const unit_definition*> by_symbol;
    // Longest spelling first, so "da" (deca) is tried before "d" (deci).
    std::vector<prefix_spelling> prefix_spellings;

    static index build();
};

dimension unit_definition::dim() const {
    std::array<rational, base_dimension_count> e{};
    for (std::size_t i = 0; i < base_dimension_count; ++i)
        e[i] = rational(exponents[i]);
    return dimension::from_exponents(e);
}

namespace {

// The exact factor of one row, or empty: see exact_factor() in the header.
std::optional<rational> read_exact_factor(const unit_definition& row) {
    if (row.source.find("rounded") != std::string_view::npos ||
        row.source.find("measured") != std::string_view::npos)
        return std::nullopt;
    const auto value = rational::parse(row.exact_factor);
    if (!value || !(value->num() > 0))
        return std::nullopt;
    return value;
}

// start × base^n for whole n, exactly; empty on overflow or a zero base with n < 0.
std::optional<rational> exact_power_product(std::optional<rational> start, rational base,
                                            std::int64_t n) {
    if (!start || (base.is_zero() && n < 0) || n > 64 || n < -64)
        return std::nullopt;
    try {
        rational result = *start;
        for (std::int64_t i = 0; i < (n < 0 ? -n : n); ++i)
            result = n < 0 ? result / base : result * base;
        return result;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

} // namespace

std::optional<rational> exact_factor(const unit_definition& row) {
    // Each row is read the first time it is asked for: a small check uses a handful of the
    // table's units, and reading them all cost a quarter of the instructions of starting plumb.
    // Two threads asking at once may both read a row (the reading is pure); the first to finish
    // keeps its value. Not std::call_once, whose static glibc build makes a system call per row.
    enum : std::uint8_t { unread, storing, stored };
    struct lazy_factor {
        std::atomic<std::uint8_t> state{unread};
        std::optional<rational> value;
    };
    const auto rows = detail::builtin_units();
    static const std::unique_ptr<lazy_factor[]> cache(new lazy_factor[rows.size()]);
    // std::less gives a total order even over pointers into different arrays.
    if (!rows.empty() && !std::less<>{}(&row, rows.data()) &&
        std::less<>{}(&row, rows.data() + rows.size())) {
        lazy_factor& entry = cache[static_cast<std::size_t>(&row - rows.data())];
        if (entry.state.load(std::memory_order_acquire) == stored)
            return entry.value;
        std::optional<rational> value = read_exact_factor(row);
        std::uint8_t expected = unread;
        if (entry.state.compare_exchange_strong(expected, storing, std::memory_order_acq_rel)) {
            entry.value = value;
            entry.state.store(stored, std::memory_order_release);
        }
        return value;
    }
    return read_exact_factor(row);
}

std::optional<rational> exact_factor(const resolved_unit& unit) {
    auto value = exact_factor(*unit.unit);
    if (!value || unit.prefix == nullptr)
        return value;
    return exact_power_product(value, rational(10), unit.prefix->power_of_ten);
}

std::optional<rational> exact_product(const std::optional<rational>& a,
                                      const std::optional<rational>& b, bool divide) {
    if (!a || !b || (divide && b->is_zero()))
        return std::nullopt;
    try {
        return divide ? *a / *b : *a * *b;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

std::optional<rational> exact_power(const std::optional<rational>& a, const rational& power) {
    if (!a || !power.is_integer())
        return std::nullopt; // a rational power of a unit is left to the double
    // An SI unit's 1, as the product below gives it for any power it takes, without its loop.
    if (*a == rational(1) && power.num() >= -64 && power.num() <= 64)
        return rational(1);
    return exact_power_product(rational(1), *a, power.num());
}

double resolved_unit::factor() const {
    if (prefix == nullptr)
        return unit->factor;
    // Powers of ten up to 1e22 are exact doubles; dividing by one (rather than multiplying by
    // an inexact 1e-6) keeps "µm" exactly the double nearest a millionth of a metre.
    double scale = 1.0;
    for (int i = 0; i < std::abs(prefix->power_of_ten); ++i)
        scale *= 10.0;
    return prefix->power_of_ten >= 0 ? unit->factor * scale : unit->factor / scale;
}

unit_table::index unit_table::index::build() {
    index idx;
    idx.units = detail::builtin_units();
    idx.prefixes = detail::builtin_prefixes();
    idx.by_symbol.reserve(idx.units.size());
    for (const unit_definition& row : idx.units)
        idx.by_symbol.emplace(row.symbol, &row);
    for (const unit_prefix& p : idx.prefixes) {
        idx.prefix_spellings.push_back({p.symbol, &p});
        // Files arrive with whichever micro their author's keyboard makes: the micro sign,
        // the Greek small mu, or ASCII "u" where Unicode is unwelcome.
        if (p.power_of_ten == -6) {
            idx.prefix_spellings.push_back({"\u03BC", &p});
            idx.prefix_spellings.push_back({"u", &p});
        }
    }
    std::stable_sort(idx.prefix_spellings.begin(), idx.prefix_spellings.end(),
                     [](const auto& a, const auto& b) { return a.text.size() > b.text.size(); });
    return idx;
}

namespace {

// Decodes UTF-8 into code points so that "°C" counts as two characters, not three bytes.
// Malformed bytes are taken one by one; suggestions only need a sensible distance.
std::vector<char32_t> code_points(std::string_view text) {
    std::vector<char32_t> out;
    out.reserve(text.size());
    for (std::size_t i = 0; i < text.size();) {
        const auto lead = static_cast<unsigned char>(text[i]);
        std::size_t length = 1;
        char32_t cp = lead;
        if (lead >= 0xF0) {
            length = 4;
            cp = lead & 0x07u;
        } else if (lead >= 0xE0) {
            length = 3;
            cp = lead & 0x0Fu;
        } else if (lead >= 0xC0) {
            length = 2;
            cp = lead & 0x1Fu;
        }
        if (i + length > text.size()) {
            length = 1;
            cp = lead;
        } else {
            for (std::size_t k = 1; k < length; ++k)
                cp = (cp << 6) | (static_cast<unsigned char>(text[i + k]) & 0x3Fu);
        }
        out.push_back(cp);
        i += length;
    }
    return out;
}

char32_t ascii_lower(char32_t c) {
    return c >= U'A' && c <= U'Z' ? c + (U'a' - U'A') : c;
}

// Edit distance in half-steps: a change of letter case costs 1, any other edit 2, so "pa"
// is nearer "Pa" than "Ga" is. Swapping two neighbours is one edit, the commonest typo.
std::size_t half_step_distance(const std::vector<char32_t>& a, const std::vector<char32_t>& b) {
    std::vector<std::size_t> before(b.size() + 1);
    std::vector<std::size_t> previous(b.size() + 1);
    std::vector<std::size_t> current(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j)
        previous[j] = 2 * j;
    for (std::size_t i = 1; i <= a.size(); ++i) {
        current[0] = 2 * i;
        for (std::size_t j = 1; j <= b.size(); ++j) {
            std::size_t substitution = 2;
            if (a[i - 1] == b[j - 1])
                substitution = 0;
            else if (ascii_lower(a[i - 1]) == ascii_lower(b[j - 1]))
                substitution = 1;
            current[j] =
                std::min({previous[j] + 2, current[j - 1] + 2, previous[j - 1] + substitution});
            if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                current[j] = std::min(current[j], before[j - 2] + 2);
        }
        std::swap(before, previous);
        std::swap(previous, current);
    }
    return previous[b.size()];
}

// How far `wanted` is from a row's name: "pascal" and "kelvin" should find their symbols,
// "gallon" should find "gallon (U.S.)", and an abbreviation of three or more letters ("sec",
// "gall") counts as one edit from the name it starts.
std::size_t name_distance(const std::vector<char32_t>& wanted, const unit_definition& row) {
    const std::string_view head = row.name.substr(0, row.name.find(" ("));
    const std::vector<char32_t> head_points = code_points(head);
    std::size_t best = half_step_distance(wanted, head_points);
    if (wanted.size() >= 3 && wanted.size() < head_points.size() &&
        std::equal(wanted.begin(), wanted.end(), head_points.begin()))
        best = std::min<std::size_t>(best, 2);
    return best;
}

bool same_but_case(std::string_view a, std::string_view b) {
    return a.size() == b.size() && a != b &&
           std::equal(a.begin(), a.end(), b.begin(), [](char x, char y) {
               return std::tolower(static_cast<unsigned char>(x)) ==
                      std::tolower(static_cast<unsigned char>(y));
           });
}

// Spellings of one unit (Ω and "ohm") share everything but the symbol; a suggestion list
// should offer each unit once.
bool same_unit(const unit_definition& a, const unit_definition& b) {
    return a.name == b.name && a.source == b.source && a.factor == b.factor &&
           a.offset == b.offset && a.exponents == b.exponents;
}

} // namespace

unit_table::unit_table() {
    // The index lives in a function-local static so that building it costs nothing until the
    // first lookup and it is never freed while the table can still be used.
    static const index built = index::build();
    index_ = &built;
}

const unit_table& unit_table::standard() {
    static const unit_table table;
    return table;
}

std::optional<resolved_unit> unit_table::resolve(std::string_view symbol) const {
    if (const auto exact = index_->by_symbol.find(symbol); exact != index_->by_symbol.end())
        return resolved_unit{exact->second, nullptr};
    for (const index::prefix_spelling& p : index_->prefix_spellings) {
        if (symbol.size() <= p.text.size() || !symbol.starts_with(p.text))
            continue;
        const auto rest = index_->by_symbol.find(symbol.substr(p.text.size()));
        if (rest != index_->by_symbol.end() && rest->second->takes_prefixes)
            return resolved_unit{rest->second, p.prefix};
    }
    return std::nullopt;
}

std::vector<std::string_view> unit_table::nearest(std::string_view symbol, std::size_t limit,
                                                  const dimension* kind) const {
    const std::vector<char32_t> wanted = code_points(symbol);
    // Allow about one edit in two characters: enough for a typo or a plural, not so many that
    // every short symbol is "near" anything.
    const std::size_t allowed = 2 * std::max<std::size_t>(1, wanted.size() / 2);

    struct candidate {
        bool other_kind;             // a unit of another dimension than the context's comes after
        std::size_t distance;        // to the symbol or the name, whichever is nearer
        std::size_t symbol_distance; // among spellings of one unit, the nearest is offered
        std::size_t symbol_length;
        const unit_definition* row;
    };
    std::vector<candidate> found;
    for (const unit_definition& row : index_->units) {
        const std::vector<char32_t> points = code_points(row.symbol);
        // "MGD" for "mgd": a symbol typed in another case is one step away however long it is.
        const std::size_t symbol_distance =
            same_but_case(symbol, row.symbol)
                ? std::min<std::size_t>(1, half_step_distance(wanted, points))
                : half_step_distance(wanted, points);
        const std::size_t distance = std::min(symbol_distance, name_distance(wanted, row));
        if (distance <= allowed)
            found.push_back({kind != nullptr && !(row.dim() == *kind), distance, symbol_distance,
                             points.size(), &row});
    }
    std::stable_sort(found.begin(), found.end(), [](const candidate& a, const candidate& b) {
        return std::tie(a.other_kind, a.distance, a.symbol_distance, a.symbol_length) <
               std::tie(b.other_kind, b.distance, b.symbol_distance, b.symbol_length);
    });
    std::vector<std::string_view> out;
    std::vector<const unit_definition*> offered;
    for (const candidate& c : found) {
        if (out.size() == limit)
            break;
        const bool repeats =
            std::any_of(offered.begin(), offered.end(),
                        [&](const unit_definition* o) { return same_unit(*o, *c.row); });
        if (repeats)
            continue;
        offered.push_back(c.row);
        out.push_back(c.row->symbol);
    }
    return out;
}

std::span<const unit_definition> unit_table::units() const {
    return index_->units;
}

std::span<const unit_prefix> unit_table::prefixes() const {
    return index_->prefixes;
}

} // namespace plumb
