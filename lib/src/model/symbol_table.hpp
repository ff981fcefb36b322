// The symbols one file can see: its dictionaries', its `use`d files' and its own.
#pragma once

#include "check/typed_term.hpp"
#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"
#include "units/compact_dimension.hpp"

#include <algorithm>
#include <cctype>
#include <cstdint>
#include <cstring>
#include <optional>
#include <string_view>
#include <vector>

namespace plumb {

struct unit_definition;

// Units as declared that some rules ask about, noted as the table is filled so that a file
// declaring none skips those rules at no cost per formula.
enum unit_mark : std::uint8_t {
    counts_revolutions = 1,      // rpm, r/min, rev/s: a speed in cycles, not radians
    at_reference_conditions = 2, // Nm3, Sm³, scf: gas at a reference pressure and temperature
    apparent_power = 4,          // VA, kVA, MVA: a power factor away from the watts
    offset_scale_readings = 8,   // °C, °F, psig, barg: readings whose scale's zero is arbitrary
    mass_fractions = 16,         // ppm, ppb: fractions the trades set beside mg/L in water
    tons = 32,                   // ton: the short ton, where cooling means a ton of refrigeration
    per_ton_of_cooling = 64,     // kW/TR: a chiller's power in per cooling out, a COP's reciprocal
    read_from_barometer = 128,   // a pressure whose words say a gauge or a vacuum reads it
};

// "NL/min", "Nl": the normal litre, a thousandth of a normal cubic metre (DIN 1343's state,
// as gas suppliers and medical gas sheets write it; common practice), as a unit of its own
// word: not the letters inside another.
[[nodiscard]] inline std::size_t normal_litre_at(std::string_view unit_text) {
    for (const std::string_view spelling : {std::string_view("NL"), std::string_view("Nl")})
        for (std::size_t at = unit_text.find(spelling); at != std::string_view::npos;
             at = unit_text.find(spelling, at + 1)) {
            const bool starts =
                at == 0 || !std::isalpha(static_cast<unsigned char>(unit_text[at - 1]));
            const std::size_t end = at + spelling.size();
            const bool ends = end == unit_text.size() ||
                              !std::isalpha(static_cast<unsigned char>(unit_text[end]));
            if (starts && ends)
                return at;
        }
    return std::string_view::npos;
}

[[nodiscard]] inline std::uint8_t unit_marks_of(std::string_view unit_text) {
    const auto has = [&](std::string_view part) {
        return unit_text.find(part) != std::string_view::npos;
    };
    std::uint8_t marks = 0;
    // Hz counts cycles too: ω = 2π·f (ISO 80000-3).
    if (has("rpm") || has("r/min") || has("rev") || has("Hz"))
        marks |= counts_revolutions;
    if (has("Nm3") || has("Sm3") || has("Nm\u00B3") || has("Sm\u00B3") || has("scf") ||
        has("SCF") || normal_litre_at(unit_text) != std::string_view::npos)
        marks |= at_reference_conditions;
    if (has("VA") && !has("VAr") && !has("VAR"))
        marks |= apparent_power;
    if (has("ppm") || has("ppb"))
        marks |= mass_fractions;
    if (has("ton"))
        marks |= tons;
    if (has("/TR") || has("/tonR"))
        marks |= per_ton_of_cooling;
    return marks;
}

// The reference temperature of a gas volume unit written in `unit` (Nm3: 0 °C, DIN 1343;
// Sm3: 15 °C, ISO 13443; scf: 60 °F, the US standard cubic foot; all at 101.325 kPa, from
// memory), with +1 where it stands above a slash and -1 below; empty where it names none,
// or two.
struct reference_volume {
    double kelvins = 0.0;
    int power = 0;
    std::string_view name; // as a message prints the conditions
    double numbers = 1.0;  // for a product: its numbers, multiplied out
    double rounding = 0.0; // and their relative rounding, summed
};
[[nodiscard]] inline std::optional<reference_volume> reference_volume_in(std::string_view unit) {
    struct spelled_reference {
        std::string_view spelling;
        double kelvins;
        std::string_view name;
    };
    static constexpr spelled_reference spellings[] = {
        {"Nm3", 273.15, "0 \u00B0C"},
        {"Nm\u00B3", 273.15, "0 \u00B0C"},
        {"Sm3", 288.15, "15 \u00B0C"},
        {"Sm\u00B3", 288.15, "15 \u00B0C"},
        {"scf", 288.15 + 5.0 / 9.0, "60 \u00B0F"},
        {"SCF", 288.15 + 5.0 / 9.0, "60 \u00B0F"},
    };
    std::optional<reference_volume> found;
    if (const std::size_t at = normal_litre_at(unit); at != std::string_view::npos) {
        const std::size_t slash = unit.find('/');
        found = reference_volume{273.15, slash != std::string_view::npos && slash < at ? -1 : 1,
                                 "0 \u00B0C"};
    }
    for (const auto& r : spellings) {
        const std::size_t at = unit.find(r.spelling);
        if (at == std::string_view::npos)
            continue;
        if (found && found->kelvins != r.kelvins)
            return std::nullopt;
        const std::size_t slash = unit.find('/');
        found = reference_volume{r.kelvins, slash != std::string_view::npos && slash < at ? -1 : 1,
                                 r.name};
    }
    return found;
}

struct symbol_entry {
    std::optional<dimension> dim; // empty when its declaration had an error (already reported)
                                  // or when it is to be inferred
    location declared_at;
    std::string_view description;
    std::string_view unit_text; // the declared unit as written ("mm", "kg/m^3"); empty for
                                // a bracket dimension
    double si_factor = 1.0;     // SI value of one declared unit; 1 for bracket dimensions
    std::optional<rational> si_exact = rational(1); // the same exactly; empty when not exact
    const unit_definition* offset_unit = nullptr;   // set when declared in °C, °F, psig...
    bool to_infer = false;                          // declared "X : ?"
    bool local = false; // declared in the file being checked, not in a dictionary
    bool used = false;
    // A temperature or pressure in an absolute unit: a reading (1) or a difference (0), worked
    // out from its name and description on first use; -1 until then.
    std::int8_t reading = -1;
    // `dim` in the checker's form, worked out once on insert rather than at every use; empty
    // when `dim` is or when it does not fit that form.
    std::optional<compact_dimension> compact_dim;
    // The checker's type of the symbol, built at its first use rather than at every use. It
    // depends only on the fields above as declared (and `reading`, fixed at first use).
    std::optional<typed_term> checked_type;
};

// Names to entries. Look-up is the hottest operation of a check (every symbol of every
// formula), so this is a flat open-addressing table with a cheap hash rather than a node-based
// map; names are views into source files that outlive the table.
class symbol_table {
  public:
    [[nodiscard, gnu::always_inline]] symbol_entry* find(std::string_view name) {
        const std::uint32_t found = find_slot(name);
        return found == empty_slot ? nullptr : &entries_[found];
    }
    // Inserts, or returns the entry already there (second = false).
    std::pair<symbol_entry*, bool> insert(std::string_view name, const symbol_entry& entry) {
        if (symbol_entry* existing = find(name))
            return {existing, false};
        // At most a quarter full: a look-up then probes 1.2 slots on average rather than 1.5
        // at half, for 16 bytes a slot beside an entry of some 350.
        if ((names_.size() + 1) * 4 > slots_.size())
            grow();
        names_.push_back(name);
        entries_.push_back(entry);
        entries_.back().compact_dim =
            entry.dim ? compact_dimension::fitted(*entry.dim) : std::nullopt;
        place(static_cast<std::uint32_t>(names_.size() - 1));
        return {&entries_.back(), true};
    }
    // Declared names closest to `name`, for "did you mean". Each call compares `name` with
    // every declared name, so a file with thousands of undeclared names among thousands of
    // declared ones would take minutes: past `max_suggestion_comparisons` in all, only the
    // cheap spellings (ASCII for Greek) are still offered, and suggestions_cut_short() says so.
    [[nodiscard]] std::vector<std::string_view> nearest(std::string_view name,
                                                        std::size_t limit = 3) const;
    [[nodiscard]] bool suggestions_cut_short() const { return suggestions_cut_short_; }
    // The unit_marks of every unit declared so far, or'ed.
    [[nodiscard]] std::uint8_t unit_marks() const { return unit_marks_; }
    void note_unit_marks(std::uint8_t marks) { unit_marks_ |= marks; }
    static constexpr std::size_t max_suggestion_comparisons = 5'000'000;

  private:
    static constexpr std::uint32_t empty_slot = 0xFFFFFFFFU;
    // A name's first eight bytes (all of a short name's) as one word, and its length: a slot
    // keeps both, so a look-up compares two words rather than the bytes of each name it meets.
    // The length is held in 32 bits, a longer one as the greatest: only names of up to eight
    // bytes are told apart by the key alone, and any other is compared in full.
    struct name_key {
        std::uint64_t word = 0;
        std::uint32_t size = 0;
    };
    struct slot {
        std::uint64_t word = 0;
        std::uint32_t size = 0;
        std::uint32_t index = empty_slot;
    };
    static_assert(sizeof(slot) == 16, "a slot's place in the table is a shift, not a multiply");

    std::vector<std::string_view> names_;
    std::vector<symbol_entry> entries_; // parallel to names_; never shrinks, so pointers into
                                        // it stay valid only until the next insert
    std::vector<slot> slots_;
    mutable std::size_t suggestion_comparisons_ = 0;
    mutable bool suggestions_cut_short_ = false;
    std::uint8_t unit_marks_ = 0;

    // The declared name equal to `name` (a view into its file), or null.
    [[nodiscard]] const std::string_view* declared_name(std::string_view name) const {
        const std::uint32_t found = find_slot(name);
        return found == empty_slot ? nullptr : &names_[found];
    }

    [[nodiscard, gnu::always_inline]] std::uint32_t find_slot(std::string_view name) const {
        if (slots_.empty())
            return empty_slot;
        const name_key key = key_of(name);
        for (std::size_t i = hash(name, key) & mask();; i = (i + 1) & mask()) {
            const slot& s = slots_[i];
            if (s.index == empty_slot)
                return empty_slot;
            if (s.word == key.word && s.size == key.size &&
                (name.size() <= 8 || same_name(names_[s.index], name)))
                return s.index;
        }
    }

    [[nodiscard]] std::size_t mask() const { return slots_.size() - 1; }

    // Names are a few bytes: compared in line, without a call to memcmp.
    static bool same_name(std::string_view a, std::string_view b) {
        if (a.size() != b.size())
            return false;
        for (std::size_t i = 0; i < a.size(); ++i)
            if (a[i] != b[i])
                return false;
        return true;
    }

    // Up to eight bytes of `p` as one word, without reading past them (names are views into
    // source text, so a load may not run over their end), the same for equal bytes and
    // different for different ones of one length: 1 to 3 bytes are gathered as first, middle
    // and last, 4 to 8 as two overlapping 4-byte loads, without a loop either way.
    [[gnu::always_inline]] static name_key key_of(std::string_view s) {
        const char* p = s.data();
        const std::size_t n = s.size();
        std::uint64_t w = 0;
        if (n >= 8) {
            std::memcpy(&w, p, 8);
        } else if (n >= 4) {
            std::uint32_t lo = 0;
            std::uint32_t hi = 0;
            std::memcpy(&lo, p, 4);
            std::memcpy(&hi, p + n - 4, 4);
            w = lo | (static_cast<std::uint64_t>(hi) << 32);
        } else if (n > 0) {
            w = static_cast<unsigned char>(p[0]) |
                (static_cast<std::uint64_t>(static_cast<unsigned char>(p[n / 2])) << 8) |
                (static_cast<std::uint64_t>(static_cast<unsigned char>(p[n - 1])) << 16);
        }
        constexpr std::size_t longest = 0xFFFFFFFFU;
        return {w, static_cast<std::uint32_t>(std::min(n, longest))};
    }

    // Names are short: the key is the whole of one up to eight bytes, mixed once; a longer
    // one's further bytes are mixed eight at a time. Only where a name sits depends on it.
    [[gnu::always_inline]] static std::size_t hash(std::string_view s, const name_key& key) {
        constexpr std::uint64_t mix = 0x9E3779B97F4A7C15ULL;
        std::uint64_t h = (key.word ^ (key.size * mix)) * mix;
        for (std::size_t i = 8; i < s.size(); i += 8) {
            std::uint64_t word = 0;
            std::memcpy(&word, s.data() + i, std::min<std::size_t>(8, s.size() - i));
            h = (h ^ word) * mix;
        }
        h ^= h >> 32;
        return static_cast<std::size_t>(h ^ (h >> 29));
    }
    void place(std::uint32_t index) {
        const name_key key = key_of(names_[index]);
        std::size_t i = hash(names_[index], key) & mask();
        while (slots_[i].index != empty_slot)
            i = (i + 1) & mask();
        slots_[i] = {key.word, key.size, index};
    }
    void grow() {
        slots_.assign(slots_.empty() ? 64 : slots_.size() * 2, slot{});
        for (std::uint32_t k = 0; k < names_.size(); ++k)
            place(k);
    }
};

} // namespace plumb
