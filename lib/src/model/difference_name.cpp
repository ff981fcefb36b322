#include "model/difference_name.hpp"

#include "model/ascii_case.hpp"

#include <string>

namespace plumb {

bool names_a_difference(std::string_view name, std::string_view description) {
    const auto starts = [&](std::string_view p) { return name.substr(0, p.size()) == p; };
    if (starts("Δ") || starts("δ") || starts("delta") || starts("Delta") || starts("LMTD") ||
        starts("lmtd"))
        return true;
    // "dT", "dp_f", "dPe", "d_T": a d before the quantity's letter. Not any name that starts
    // with a d: "disch_T", "dew_t", "dhw_t" and "d3" are readings, which set beside another
    // scale's must still be reported.
    if (starts("d")) {
        std::size_t at = 1;
        if (at < name.size() && name[at] == '_')
            ++at;
        if (at < name.size() && std::string_view("TtPp").find(name[at]) != std::string_view::npos)
            return true;
        if (at < name.size() && name[at] == 'h' &&
            (at + 1 == name.size() || !(name[at + 1] >= 'a' && name[at + 1] <= 'z')))
            return true;
        if (name.substr(at).starts_with("θ"))
            return true;
    }
    for (const std::string_view word : {"rise", "drop", "diff", "loss", "lm", "approach", "fric"})
        if (name.find(word) != std::string_view::npos)
            return true;
    // Whole words (a plural too), so that "wellhead", "headspace" and "droplet" are not
    // read as differences; "head" not at all, as "sprinkler head pressure" is a reading.
    const auto is_letter = [](char c) {
        return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c & 0x80) != 0;
    };
    // "Range (hot - cold water)": a capital is the same word. "net driving pressure" (reverse
    // osmosis, feed less permeate less osmotic), "differential pressure": differences too.
    std::string lower(description);
    for (char& c : lower)
        if (c >= 'A' && c <= 'Z')
            c = static_cast<char>(c - 'A' + 'a');
    description = lower;
    // "conductor temperature, absolute, as the loss workbook carries it": a description that
    // calls the quantity absolute names a reading, whatever else its words qualify.
    if (description.find("absolute") != std::string_view::npos &&
        description.find("absolute difference") == std::string_view::npos)
        return false;
    // "pore water pressure, above atmospheric": a pressure counted from the atmosphere is its
    // difference from it, as a gauge reads.
    if (description.find("above atmospher") != std::string_view::npos ||
        description.find("above the atmospher") != std::string_view::npos)
        return true;
    // "Water column over the diffusers": a liquid column's pressure, ρ·g·h, is its weight
    // per area above the surface's, a difference as "hydrostatic" is (a distillation
    // column's top pressure, a reading, says no "water column").
    // "pore water pressure": the u of σ' = σ - u counts from the atmosphere, as a vented
    // piezometer reads it (Terzaghi's effective stress; common practice).
    for (const std::string_view phrase :
         {"water column", "liquid column", "column of water", "column of liquid", "pore pressure",
          "pore water pressure", "pore-water pressure", "porewater pressure"})
        if (description.find(phrase) != std::string_view::npos)
            return true;
    // "180 °F at the manifold plus line loss": a word that a reading is taken with, after or
    // before names a difference beside the quantity, not the quantity itself.
    const auto beside_a_reading = [&](std::size_t at) {
        std::size_t end = at;
        for (int words = 0; words < 2; ++words) {
            while (end > 0 && !is_letter(description[end - 1]))
                --end;
            std::size_t begin = end;
            while (begin > 0 && is_letter(description[begin - 1]))
                --begin;
            if (begin == end)
                return false;
            const std::string_view before = description.substr(begin, end - begin);
            for (const std::string_view joining :
                 {"plus", "less", "minus", "after", "before", "allowing", "with", "without",
                  "excluding", "including"})
                if (before == joining)
                    return true;
            end = begin;
        }
        return false;
    };
    // "pipe friction to the perforations": a friction pressure or head is a loss.
    for (const std::string_view word :
         {"difference", "differential", "rise", "drop", "loss", "change", "increase", "decrease",
          "approach", "range", "gradient", "swing", "hydrostatic", "net", "driving", "friction"})
        for (std::size_t at = description.find(word); at != std::string_view::npos;
             at = description.find(word, at + 1)) {
            std::size_t end = at + word.size();
            if (description.substr(end, 2) == "es")
                end += 2;
            else if (description.substr(end, 1) == "s")
                end += 1;
            if ((at == 0 || !is_letter(description[at - 1])) &&
                (end >= description.size() || !is_letter(description[end])) &&
                !beside_a_reading(at))
                return true;
        }
    return false;
}

bool counts_below_the_barometer(std::string_view name, std::string_view description) {
    const bool said = name.find("vac") != std::string_view::npos ||
                      description.find("vacuum") != std::string_view::npos ||
                      description.find("Vacuum") != std::string_view::npos;
    // "mmHg abs, as the old vacuum recorder logs it": "abs" and "(a)" say absolute too.
    return said && description.find("abs") == std::string_view::npos &&
           description.find("Abs") == std::string_view::npos &&
           description.find("ABS") == std::string_view::npos &&
           description.find("(a)") == std::string_view::npos &&
           name.find("abs") == std::string_view::npos;
}

bool describes_a_gauge_reading(std::string_view description) {
    const std::string words = lower_ascii(description);
    for (const std::string_view other :
         {"absolute", "vacuum", "below", "above", "barometer", "atmospher", "strain gauge",
          "rain gauge", "wire gauge", "track gauge", "gauge length", "differential"})
        if (words.find(other) != std::string::npos)
            return false;
    const auto is_letter = [](char c) { return c >= 'a' && c <= 'z'; };
    for (std::size_t at = words.find("gauge"); at != std::string::npos;
         at = words.find("gauge", at + 1)) {
        const std::size_t end = at + 5;
        if ((at == 0 || !is_letter(words[at - 1])) &&
            (end == words.size() || !is_letter(words[end]) || words[end] == 'd'))
            return true;
    }
    return false;
}

bool names_a_site_barometer(std::string_view name, std::string_view description) {
    if (!names_the_atmosphere(name, description))
        return false;
    for (const std::string_view word :
         {"standard", "Standard", "vacuum", "Vacuum", "below", "gauge"})
        if (description.find(word) != std::string_view::npos)
            return false;
    return true;
}

bool names_a_stress(std::string_view name, std::string_view description) {
    if (name.starts_with("\u03C3") || name.starts_with("\u03C4") || name.starts_with("sigma") ||
        name.starts_with("tau"))
        return true;
    // A soil's cohesion and a modulus are stresses too, never pressure readings.
    for (const std::string_view word : {"stress", "strength", "Stress", "Strength", "cohesion",
                                        "Cohesion", "shear", "Shear", "modulus", "Modulus"})
        if (description.find(word) != std::string_view::npos)
            return true;
    return false;
}

bool names_the_atmosphere(std::string_view name, std::string_view description) {
    for (const std::string_view word : {"atm", "baro", "amb"})
        if (name.find(word) != std::string_view::npos)
            return true;
    for (const std::string_view word : {"atmospher", "barometr", "barometer", "ambient"})
        if (description.find(word) != std::string_view::npos)
            return true;
    return false;
}

bool names_specific_gravity(std::string_view name, std::string_view description) {
    std::string lower(description);
    for (char& c : lower)
        if (c >= 'A' && c <= 'Z')
            c = static_cast<char>(c - 'A' + 'a');
    return name == "SG" || name.starts_with("SG_") || name == "sg" ||
           lower.find("specific gravity") != std::string::npos ||
           lower.find("relative density") != std::string::npos;
}

round_length names_a_diameter_or_radius(std::string_view name, std::string_view description) {
    std::string lower(description);
    for (char& c : lower)
        if (c >= 'A' && c <= 'Z')
            c = static_cast<char>(c - 'A' + 'a');
    const auto says = [&](std::string_view word) { return lower.find(word) != std::string::npos; };
    const bool radius = name.starts_with("r") || name.starts_with("R") || says("radius");
    const bool diameter = name.starts_with("D") || name.starts_with("d") || says("diameter");
    if (radius == diameter)
        return round_length::none;
    return radius ? round_length::radius : round_length::diameter;
}

} // namespace plumb
