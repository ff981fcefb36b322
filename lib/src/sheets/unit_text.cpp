// Unit texts are rewritten into the notation's unit syntax and read by the notation's own
// parser, so a cell's "kg/m³" means exactly what "kg/m^3" means in a .plumb file.
#include "sheets/unit_text.hpp"

#include "model/difference_name.hpp"

#include "notation/parser.hpp"

#include <algorithm>
#include <array>
#include <deque>
#include <memory>
#include <mutex>
#include <unordered_map>
#include <vector>

namespace plumb::sheets {

namespace {

// Gauge pressures the table has no row for ("kPa(g)"): built once per base unit, against
// the standard atmosphere as the table's psig and barg rows are (common practice).
const unit_definition* gauge_of(std::string_view base_symbol, const resolved_unit& base) {
    static std::mutex lock;
    static std::deque<std::string> symbols;
    static std::deque<unit_definition> rows;
    const std::scoped_lock guard(lock);
    const std::string symbol = std::string(base_symbol) + "(g)";
    for (const auto& r : rows)
        if (r.symbol == symbol)
            return &r;
    symbols.push_back(symbol);
    unit_definition row = *base.unit;
    row.symbol = symbols.back();
    row.name = "gauge pressure";
    row.factor = base.factor();
    row.offset = 101325.0;
    row.scale = unit_scale::gauge;
    row.takes_prefixes = false;
    row.source = "common practice: gauge pressure read against the standard atmosphere";
    rows.push_back(row);
    return &rows.back();
}

std::string trim(std::string_view s) {
    const auto blank = [](char c) { return c == ' ' || c == '\t' || c == '\n' || c == '\r'; };
    while (!s.empty() && blank(s.front()))
        s.remove_prefix(1);
    while (!s.empty() && blank(s.back()))
        s.remove_suffix(1);
    return std::string(s);
}

bool is_letter(char c) {
    return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}

// "m3/s" -> "m^3/s", "m²" -> "m^2", "m⁻¹" -> "m^-1".
std::string to_notation(std::string_view t) {
    std::string out;
    // "Nm³", "kg/Sm3": the gas trades' normal and standard cubic metres, one symbol each.
    const auto after_gas_volume = [&] {
        const std::size_t n = out.size();
        return n >= 2 && (out[n - 2] == 'N' || out[n - 2] == 'S') && out[n - 1] == 'm' &&
               (n == 2 || !is_letter(out[n - 3]));
    };
    for (std::size_t i = 0; i < t.size(); ++i) {
        const std::string_view rest = t.substr(i);
        if ((rest.substr(0, 2) == "\u00B3" || rest.substr(0, 1) == "3") && after_gas_volume()) {
            out += '3';
            i += rest[0] == '3' ? 0 : 1;
            continue;
        }
        if (rest.substr(0, 2) == "\u00B2" || rest.substr(0, 2) == "\u00B3" ||
            rest.substr(0, 2) == "\u00B9") {
            out += rest[1] == '\xB2' ? "^2" : rest[1] == '\xB3' ? "^3" : "^1";
            ++i;
            continue;
        }
        if (rest.substr(0, 3) == "\u207B") { // superscript minus
            out += "^-";
            i += 2;
            if (t.substr(i + 1, 2) == "\u00B9" || t.substr(i + 1, 2) == "\u00B2" ||
                t.substr(i + 1, 2) == "\u00B3") {
                out += t[i + 2] == '\xB2' ? "2" : t[i + 2] == '\xB3' ? "3" : "1";
                i += 2;
            }
            continue;
        }
        // "inH2O/100 ft", "ftH2O": water's formula inside a unit's symbol is no power.
        if (rest.starts_with("H2O")) {
            out += "H2O";
            i += 2;
            continue;
        }
        const char c = t[i];
        if (c >= '0' && c <= '9' && i > 0 && is_letter(t[i - 1]))
            out += '^';
        out += c;
    }
    return out;
}

// Units a sidecar defines with a zero of their own are rows of the parsed sidecar text; a unit
// read from them keeps its row, so the rows outlive the parse.
void keep_rows(const syntax::parsed_file& tree) {
    thread_local std::vector<std::shared_ptr<const syntax::defined_unit::scale_row>> kept;
    for (const auto& u : tree.units)
        if (u.origin != nullptr && std::find(kept.begin(), kept.end(), u.origin) == kept.end() &&
            kept.size() < 4096)
            kept.push_back(u.origin);
}

// The measure lines a unit text may need: those that define a name the text holds, and the
// lines those need in turn, a few levels deep. A sidecar of many measure lines is then not
// parsed again for every unit text, and a text's cache entry does not hold them all.
std::string measures_named_in(std::string_view text, std::string_view measures) {
    if (measures.empty())
        return {};
    struct measure_line {
        std::string_view name;
        std::string_view whole;
        bool taken = false;
    };
    std::vector<measure_line> lines;
    for (std::size_t at = 0; at < measures.size();) {
        const std::size_t end = std::min(measures.find('\n', at), measures.size());
        const std::string_view whole = measures.substr(at, end - at);
        std::string_view rest = whole;
        while (!rest.empty() && (rest.front() == ' ' || rest.front() == '\t'))
            rest.remove_prefix(1);
        if (rest.rfind("measure", 0) == 0) {
            rest.remove_prefix(7);
            while (!rest.empty() && (rest.front() == ' ' || rest.front() == '\t'))
                rest.remove_prefix(1);
            const std::size_t stop = rest.find_first_of(" \t=");
            lines.push_back({rest.substr(0, stop), whole});
        }
        at = end + 1;
    }
    std::string wanted(text);
    constexpr int most_levels = 4;
    for (int level = 0; level < most_levels; ++level) {
        bool added = false;
        for (auto& l : lines)
            if (!l.taken && !l.name.empty() && wanted.find(l.name) != std::string::npos) {
                l.taken = true;
                wanted += ' ';
                wanted += l.whole;
                added = true;
            }
        if (!added)
            break;
    }
    std::string out;
    for (const auto& l : lines)
        if (l.taken) {
            out += l.whole;
            out += '\n';
        }
    return out;
}

// Whether a `measure` line among `measures` defines `name` itself.
bool defines(std::string_view measures, std::string_view name) {
    for (std::size_t at = measures.find(name); at != std::string_view::npos;
         at = measures.find(name, at + 1)) {
        const std::size_t end = at + name.size();
        if (end < measures.size() && measures[end] != ' ' && measures[end] != '=' &&
            measures[end] != '\t')
            continue;
        std::size_t before = at;
        while (before > 0 && (measures[before - 1] == ' ' || measures[before - 1] == '\t'))
            --before;
        if (before >= 7 && measures.substr(before - 7, 7) == "measure" && before < at)
            return true;
    }
    return false;
}

// The text as the notation reads a declaration: "x : <unit>", after the measure lines.
std::string as_declaration(std::string_view notation, std::string_view measures) {
    std::string source(measures);
    if (!source.empty() && source.back() != '\n')
        source += '\n';
    source += "x : ";
    source += notation;
    return source;
}

// How the trades type units beside cells, as the notation spells them (common practice):
// "in. w.g." for inches of water, "hr" for the hour, "CFM" in capitals, "kNm" for kN·m,
// "sq ft", "bhp" (brake horsepower, a horsepower), "bara" (bar absolute).
// "kg O2/d", "lb BOD/d", "mg/L as CaCO3"'s cousin "kg CaCO3/d": a mass named for what it is
// of, as the treatment trades write it (Metcalf & Eddy, from memory); the unit is the mass's.
std::string without_species(std::string t) {
    static constexpr std::array<std::string_view, 6> masses{"kg", "g", "mg", "lb", "t", "tonne"};
    static constexpr std::array<std::string_view, 14> species{
        "O2",  "O\u2082", "CO2", "CO\u2082", "BOD", "BOD5",  "COD",
        "TSS", "VSS",     "DS",  "N",        "P",   "NH3-N", "CaCO3"};
    for (const std::string_view what : species)
        for (std::size_t at = t.find(what); at != std::string::npos; at = t.find(what, at + 1)) {
            const std::size_t end = at + what.size();
            if (at < 2 || t[at - 1] != ' ' || (end < t.size() && t[end] != '/' && t[end] != ' '))
                continue;
            const std::size_t start = t.rfind(' ', at - 2);
            const std::size_t begin = start == std::string::npos ? 0 : start + 1;
            const std::string_view mass(t.data() + begin, at - 1 - begin);
            if (std::find(masses.begin(), masses.end(), mass) == masses.end())
                continue;
            t.erase(at - 1, what.size() + 1);
            break;
        }
    return t;
}

std::string trade_spelling(std::string t) {
    t = without_species(std::move(t));
    static constexpr std::array<std::pair<std::string_view, std::string_view>, 136> whole{{
        {"in. w.g.", "inH2O"},
        {"in.w.g.", "inH2O"},
        {"in w.g.", "inH2O"},
        {"in wg", "inH2O"},
        {"in. wg", "inH2O"},
        {"in.wg", "inH2O"},
        {"in WG", "inH2O"},
        {"inWG", "inH2O"},
        {"in. w.c.", "inH2O"},
        {"in.w.c.", "inH2O"},
        {"in wc", "inH2O"},
        {"iwg", "inH2O"},
        {"IWG", "inH2O"},
        {"in WC", "inH2O"},
        {"in. WC", "inH2O"},
        {"in H2O", "inH2O"},
        {"in. H2O", "inH2O"},
        {"in.H2O", "inH2O"},
        {"in H\u2082O", "inH2O"},
        {"in. H\u2082O", "inH2O"},
        {"inches H2O", "inH2O"},
        {"inches of water", "inH2O"},
        {"\"H2O", "inH2O"},
        {"\" H2O", "inH2O"},
        {"\" w.c.", "inH2O"},
        {"\" w.g.", "inH2O"},
        {"\"w.c.", "inH2O"},
        {"\"w.g.", "inH2O"},
        {"\"WC", "inH2O"},
        {"\"wc", "inH2O"},
        {"\"WG", "inH2O"},
        {"in w.c.", "inH2O"},
        // The millimetre of water of fan and filter data sheets (NIST SP 811 (2008), B.8).
        {"mm w.g.", "mmH2O"},
        {"mm wg", "mmH2O"},
        {"mm WG", "mmH2O"},
        {"mmWG", "mmH2O"},
        {"mm w.c.", "mmH2O"},
        {"mm WC", "mmH2O"},
        {"mmWC", "mmH2O"},
        {"mm H2O", "mmH2O"},
        {"mm H\u2082O", "mmH2O"},
        // Humidity ratios in grains of moisture per pound of dry air (ASHRAE, common practice).
        {"grains/lb", "gr/lb"},
        {"grains per lb", "gr/lb"},
        {"gr/lb da", "gr/lb"},
        {"grains/lb da", "gr/lb"},
        // A gauge reading of the inch of water said in words beside the unit.
        {"in. w.c. g", "inH2Og"},
        {"in. w.c.(g)", "inH2Og"},
        {"in. w.c. (g)", "inH2Og"},
        {"in. w.c. gauge", "inH2Og"},
        {"in w.c. g", "inH2Og"},
        {"in. w.g. (g)", "inH2Og"},
        {"in. w.g. gauge", "inH2Og"},
        // A share by mass or volume as the chemical trades write it (common practice): the
        // words say what the percentage is of, and the unit is the percent.
        {"% w/w", "%"},
        {"% (w/w)", "%"},
        {"%w/w", "%"},
        {"w/w %", "%"},
        {"% wt", "%"},
        {"wt%", "%"},
        {"wt %", "%"},
        {"wt.%", "%"},
        {"% by weight", "%"},
        {"% by mass", "%"},
        {"% m/m", "%"},
        {"% v/v", "%"},
        {"% (v/v)", "%"},
        {"vol%", "%"},
        {"vol %", "%"},
        {"bara", "bar"},
        {"BPD", "bbl/d"},
        {"bpd", "bbl/d"},
        {"bhp", "hp"},
        {"BHP", "hp"},
        {"kNm", "kN m"},
        {"kN-m", "kN m"},
        {"kN.m", "kN m"},
        {"Nm", "N m"},
        {"N-m", "N m"},
        {"N.m", "N m"},
        {"sq ft", "ft2"},
        {"sq. ft", "ft2"},
        {"sq.ft", "ft2"},
        {"sq m", "m2"},
        {"sq. m", "m2"},
        {"sq in", "in2"},
        {"sq. in", "in2"},
        {"cu ft", "ft3"},
        {"cu m", "m3"},
        {"CFM", "cfm"},
        {"FPM", "fpm"},
        {"GPM", "gpm"},
        {"RPM", "rpm"},
        {"MGD", "mgd"},
        {"SCFM", "scf/min"},
        {"scfm", "scf/min"},
        // Moments and torques as US drawings write them: the pound is the pound-force there,
        // and "k" the kip (AISC's kip-ft, k-ft).
        {"lb-ft", "lbf ft"},
        {"ft-lb", "ft lbf"},
        {"lb-in", "lbf in"},
        {"in-lb", "in lbf"},
        {"ft-lbs", "ft lbf"},
        {"lb\u00B7ft", "lbf ft"},
        {"ft\u00B7lb", "ft lbf"},
        {"lb\u00B7in", "lbf in"},
        {"in\u00B7lb", "in lbf"},
        {"lb-ft/ft", "lbf"},
        {"k-ft", "kip ft"},
        {"k-in", "kip in"},
        {"kip-ft", "kip ft"},
        {"kip-in", "kip in"},
        // Storage volumes in US hydrology: the acre-foot and acre-inch.
        {"acre-ft", "acre ft"},
        {"ac-ft", "acre ft"},
        {"acre-in", "acre in"},
        {"ac-in", "acre in"},
        // A chiller's efficiency and flows per ton are per ton of refrigeration, never per
        // short ton of mass.
        {"kW/ton", "kW/TR"},
        {"gpm/ton", "gpm/TR"},
        {"cfm/ton", "cfm/TR"},
        // The US gallon named as such (NIST SP 811 (2008), B.8: "gallon (U.S.)"), the only
        // gallon the table holds.
        {"US gal", "gal"},
        {"U.S. gal", "gal"},
        {"USgal", "gal"},
        {"US gallon", "gal"},
        {"gal (US)", "gal"},
        {"US gal/min", "gpm"},
        // A quarry's and a haulier's short tons an hour (2000 lb; NIST SP 811 (2008), B.8).
        {"stph", "ton/h"},
        {"STPH", "ton/h"},
        {"short ton/h", "ton/h"},
        // A specific gravity's column, a ratio to water's density; a brewer's degrees Plato,
        // grams of extract per 100 g of wort, a share by mass (ASBC, common practice).
        {"SG", "1"},
        {"S.G.", "1"},
        {"\u00B0P", "%"},
        {"\u00B0Plato", "%"},
        // Plurals as headings write them.
        {"gallons", "gal"},
        {"acres", "acre"},
        {"feet", "ft"},
        {"inches", "in"},
        {"days", "d"},
        {"hours", "h"},
        {"minutes", "min"},
    }};
    for (const auto& [typed, unit] : whole)
        if (t == typed)
            return std::string(unit);
    // "in. w.g./100 ft", "in. w.c. per 100 ft": a friction rate whose numerator is spelled
    // as the trades spell it, read as that spelling over the rest.
    for (const std::string_view over : {std::string_view("/"), std::string_view(" per ")}) {
        const std::size_t at = t.find(over);
        if (at == std::string::npos || at == 0)
            continue;
        std::string_view above(t.data(), at);
        while (!above.empty() && above.back() == ' ')
            above.remove_suffix(1);
        for (const auto& [typed, unit] : whole)
            if (above == typed && unit.find(' ') == std::string_view::npos) {
                std::string rest = t.substr(at + over.size());
                while (!rest.empty() && rest.front() == ' ')
                    rest.erase(0, 1);
                return trade_spelling(std::string(unit) + "/" + rest);
            }
    }
    // "US gal/h", "Btu/US gal", "US gpm": the US gallon named as such inside a longer unit.
    static constexpr std::array<std::pair<std::string_view, std::string_view>, 8> us_gallon{{
        {"U.S. gallons", "gal"},
        {"U.S. gallon", "gal"},
        {"US gallons", "gal"},
        {"US gallon", "gal"},
        {"U.S. gal", "gal"},
        {"US gal", "gal"},
        {"USgal", "gal"},
        {"US gpm", "gpm"},
    }};
    for (const auto& [typed, unit] : us_gallon)
        for (std::size_t at = t.find(typed); at != std::string::npos;
             at = t.find(typed, at + unit.size())) {
            const std::size_t end = at + typed.size();
            if ((at == 0 || !is_letter(t[at - 1])) && (end == t.size() || !is_letter(t[end])))
                t.replace(at, typed.size(), unit);
        }
    // "kWh/MG", "lb/MG": the US water trade's million gallons as a word of its own (not the
    // megagram, Mg).
    for (std::size_t at = t.find("MG"); at != std::string::npos; at = t.find("MG", at + 1)) {
        const bool alone =
            (at == 0 || !is_letter(t[at - 1])) && (at + 2 >= t.size() || !is_letter(t[at + 2]));
        if (alone)
            t.replace(at, 2, "Mgal");
    }
    // "Btu/hr", "lb/hr", "m3/hr": the hour as a word of its own.
    for (std::size_t at = t.find("hr"); at != std::string::npos; at = t.find("hr", at + 1)) {
        const bool alone =
            (at == 0 || !is_letter(t[at - 1])) && (at + 2 >= t.size() || !is_letter(t[at + 2]));
        if (alone)
            t.replace(at, 2, "h");
    }
    // "W/m2K", "W/m²K", "kJ/kg.K", "Btu/h·ft²·°F": everything after a single '/' is the
    // denominator, its units multiplied by '.' or '·' or written one after another after a
    // power (common practice; ISO 80000-1 would bracket them).
    const std::size_t slash = t.find('/');
    if (slash != std::string::npos && t.find('/', slash + 1) == std::string::npos &&
        t.find('(') == std::string::npos) {
        std::string below = t.substr(slash + 1);
        // "Btu/h·ft²·°F", the I-P handbooks' U-value: the middle dot multiplies below the line.
        for (const std::string_view dot : {"\u00B7", "\u22C5"})
            for (std::size_t at = below.find(dot); at != std::string::npos; at = below.find(dot))
                below.replace(at, dot.size(), " ");
        for (std::size_t i = 1; i + 1 < below.size(); ++i)
            if (below[i] == '.' && is_letter(below[i - 1]) && is_letter(below[i + 1]))
                below[i] = ' ';
        std::string spaced;
        for (std::size_t i = 0; i < below.size(); ++i) {
            spaced += below[i];
            const bool power_ends = (below[i] >= '2' && below[i] <= '4') ||
                                    (i > 0 && below.compare(i - 1, 2, "\u00B2") == 0) ||
                                    (i > 0 && below.compare(i - 1, 2, "\u00B3") == 0);
            if (power_ends && i + 1 < below.size() && is_letter(below[i + 1]))
                spaced += ' ';
        }
        if (spaced.find(' ') != std::string::npos)
            t = t.substr(0, slash + 1) + "(" + spaced + ")";
    }
    return t;
}

// "psi/100 ft" as "psi/per_100_ft" with the measure line that defines it, which is returned;
// the text is left alone, and nothing returned, where it holds no such length.
std::string per_round_count(std::string& t) {
    const std::size_t slash = t.find('/');
    if (slash == std::string::npos || t.find('/', slash + 1) != std::string::npos)
        return {};
    std::size_t at = slash + 1;
    while (at < t.size() && t[at] == ' ')
        ++at;
    // The trades' spelling brackets a spaced denominator: "psi/(100 ft)".
    const bool bracketed = at < t.size() && t[at] == '(' && t.back() == ')';
    if (bracketed)
        ++at;
    const std::size_t digits = at;
    while (at < t.size() && t[at] >= '0' && t[at] <= '9')
        ++at;
    const std::string count = t.substr(digits, at - digits);
    if (count != "10" && count != "100" && count != "1000")
        return {};
    while (at < t.size() && t[at] == ' ')
        ++at;
    const std::string length = t.substr(at, t.size() - at - (bracketed ? 1 : 0));
    if (length.empty() || !is_letter(length.front()) ||
        length.find_first_of(" ()*/^") != std::string::npos ||
        !unit_table::standard().resolve(length))
        return {};
    const std::string name = "per_" + count + "_" + length;
    if (name.find_first_not_of("abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789_") !=
        std::string::npos)
        return {};
    t = t.substr(0, slash + 1) + name;
    return "measure " + name + " = " + count + " " + length + "\n";
}

std::optional<written_unit> evaluate(std::string_view text, std::string_view measures) {
    std::string t = trim(text);
    if (t.empty() || t.size() > 40)
        return std::nullopt;
    // "1 in", "3 ft": a size typed in a cell (a pipe's nominal size right of its flow, as
    // hydraulic calc forms print it), not a unit; "1/s" is one.
    if (const std::size_t number_end = t.find_first_not_of("0123456789.");
        number_end != 0 && number_end != std::string::npos && t[number_end] == ' ')
        return std::nullopt;
    // A sidecar's own measure comes before the trade's spelling: "BHP" is mechanical
    // horsepower as the trades spell it, unless the sidecar says the boiler's.
    if (!defines(measures, t))
        t = trade_spelling(std::move(t));
    if (t == "\u00B0")
        t = "deg"; // the degree of angle, written alone
    if (t == "-" || t == "1" || t == "\u2014" || t == "\u2013") {
        written_unit u;
        u.text = t;
        return u;
    }
    // Gauge and absolute marks: "kPa(g)", "kPa (g)", "kPa g", "kPag"; "kPa(a)", "kPa abs".
    bool gauge = false;
    for (const std::string_view mark : {"(g)", " (g)", " g", "(a)", " (a)", " abs", " a"}) {
        if (t.size() > mark.size() && t.compare(t.size() - mark.size(), mark.size(), mark) == 0) {
            gauge = mark.find('g') != std::string_view::npos;
            t = trim(t.substr(0, t.size() - mark.size()));
            break;
        }
    }
    // "Δ°C" and "delta °C": a difference, of the size of the kelvin (SI Brochure 9th ed.,
    // 2.3.1: a Celsius difference equals the kelvin difference).
    for (const std::string_view delta : {"\u0394", "delta "})
        if (t.rfind(delta, 0) == 0) {
            t = trim(t.substr(delta.size()));
            if (t == "\u00B0C")
                t = "K";
            else if (t == "\u00B0F")
                t = "\u00B0R";
        }
    // "kPag": a pressure unit with a gauge g that the table has no row for (it has psig, barg).
    if (!gauge && t.size() > 2 && t.back() == 'g' && !unit_table::standard().resolve(t)) {
        const auto base = unit_table::standard().resolve(t.substr(0, t.size() - 1));
        const auto pascal = unit_table::standard().resolve("Pa");
        if (base && pascal && base->dim() == pascal->dim()) {
            gauge = true;
            t.pop_back();
        }
    }
    // A row whose symbol holds a digit ("inH2O") is read as written.
    std::string notation = unit_table::standard().resolve(t) ? t : to_notation(t);
    // "Ω/1000 ft", "psi/100 ft", "kW/100 scfm": tables print a loss per a round count of a
    // unit, which is read as a measure of its own.
    const std::string per_count = per_round_count(notation);
    // A declaration, not a quantity in braces: there "h" would be Planck's constant.
    const source_file src("<unit>", as_declaration(notation, per_count + std::string(measures)));
    const syntax::parsed_file tree = parse_file(src);
    if (tree.has_syntax_error || !tree.diagnostics.empty() || tree.declarations.size() != 1)
        return std::nullopt;
    keep_rows(tree);
    const syntax::declared_kind& q = tree.declarations.front().kind;
    if (!q.dim || !q.by_unit)
        return std::nullopt;
    written_unit u;
    u.dim = *q.dim;
    u.scale = q.si_factor;
    u.exact_scale = q.si_exact;
    u.text = trim(text);
    if (q.single_unit != nullptr && q.single_unit->scale != unit_scale::absolute)
        u.offset = q.single_unit;
    if (gauge) {
        const auto base = unit_table::standard().resolve(notation);
        if (!base || base->unit->scale != unit_scale::absolute)
            return std::nullopt;
        const auto pascal = unit_table::standard().resolve("Pa");
        if (!(base->dim() == pascal->dim()))
            return std::nullopt;
        u.offset = gauge_of(notation, *base);
    }
    return u;
}

} // namespace

std::optional<written_unit> read_unit_text(std::string_view text, std::string_view all_measures) {
    const std::string measures = measures_named_in(text, all_measures);
    // Reading a unit costs a parse; calcs repeat a handful of unit texts thousands of times.
    thread_local std::unordered_map<std::string, std::optional<written_unit>> cache;
    std::string key(text);
    if (!measures.empty()) {
        key += '\0';
        key += measures;
    }
    if (const auto it = cache.find(key); it != cache.end())
        return it->second;
    auto u = cache.size() < 100000 ? evaluate(text, measures) : std::nullopt;
    if (cache.size() < 100000)
        cache.emplace(key, u);
    return u;
}

namespace {

// "ΔT [°F]", "Temperature rise (°C)": a column of temperature differences headed in the scale's
// unit holds differences in its degrees, as the notation's "ΔT : Δ°F" does. The heading's
// first word is read as a name only where it is written as one (ΔT, δt, dT), so that
// "Design temperature" is no difference.
std::optional<written_unit> heading_unit(std::string_view label, std::string_view unit,
                                         std::string_view measures) {
    std::optional<written_unit> u = read_unit_text(unit, measures);
    if (!u || u->offset == nullptr || u->offset->scale != unit_scale::offset)
        return u;
    const std::string words = trim(label);
    // Any word of the heading may be the symbol: "CW ΔT [°F]".
    bool symbol = false;
    for (std::size_t at = 0; at < words.size() && !symbol;) {
        const std::size_t end = std::min(words.find(' ', at), words.size());
        const std::string_view word = std::string_view(words).substr(at, end - at);
        symbol = word.starts_with("\u0394") || word.starts_with("\u03B4") ||
                 (word.size() >= 2 && word[0] == 'd' && word[1] >= 'A' && word[1] <= 'Z');
        at = end + 1;
    }
    if (!symbol && !names_a_difference({}, words))
        return u;
    if (auto difference = read_unit_text("\u0394" + trim(unit), measures)) {
        difference->text = u->text;
        return difference;
    }
    return u;
}

} // namespace

// The heading's label and the text in its last brackets or parentheses.
static std::optional<std::pair<std::string, std::string>> heading_parts(std::string_view text) {
    const std::string t = trim(text);
    if (t.size() < 3)
        return std::nullopt;
    const char close = t.back();
    if (close != ']' && close != ')')
        return std::nullopt;
    const char open = close == ']' ? '[' : '(';
    // The matching opening bracket, allowing "W/(m·K)" inside parentheses.
    int depth = 0;
    for (std::size_t i = t.size(); i-- > 0;) {
        if (t[i] == close)
            ++depth;
        else if (t[i] == open && --depth == 0)
            return std::pair{t.substr(0, i), t.substr(i + 1, t.size() - i - 2)};
    }
    return std::nullopt;
}

std::optional<written_unit> read_heading_unit(std::string_view text, std::string_view measures) {
    const auto parts = heading_parts(text);
    if (!parts)
        return std::nullopt;
    return heading_unit(parts->first, parts->second, measures);
}

std::optional<std::string> heading_unit_text(std::string_view text) {
    const auto parts = heading_parts(text);
    if (!parts || trim(parts->second).empty())
        return std::nullopt;
    return trim(parts->second);
}

std::string unit_text_problem(std::string_view text, std::string_view all_measures) {
    const std::string t = trim(text);
    if (t.empty() || t.size() > 40)
        return {};
    const std::string measures = measures_named_in(t, all_measures);
    // As read_unit_text: a column of cells beside one unreadable text asks once.
    thread_local std::unordered_map<std::string, std::string> cache;
    const std::string key = t + '\0' + measures;
    if (const auto it = cache.find(key); it != cache.end())
        return it->second;
    const std::string notation = to_notation(t);
    const source_file src("<unit>", as_declaration(notation, measures));
    const syntax::parsed_file tree = parse_file(src);
    const auto unit_begin = static_cast<std::uint32_t>(src.text().size() - notation.size());
    std::string problem;
    for (const auto& d : tree.diagnostics)
        if (d.where.range.begin >= unit_begin) {
            problem = d.message;
            break;
        }
    if (cache.size() < 100000)
        cache.emplace(key, problem);
    return problem;
}

} // namespace plumb::sheets
