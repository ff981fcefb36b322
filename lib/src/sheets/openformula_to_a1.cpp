// OpenFormula references to A1 form, so that both formats reach the one A1 grammar and every
// finding shows the formula the way the spreadsheet shows it.
#include "plumb/openformula.hpp"
#include "plumb/openformula_errors.hpp"
#include "sheets/readers.hpp"

#include <fmt/format.h>

namespace plumb::sheets {

namespace {

namespace pg = tao::pegtl;
namespace of = plumb::openformula;

struct translation {
    std::string out;
    // The reference being read: its parts.
    std::string first_sheet;
    std::string sheet;
    std::string location;
    std::string first_location;
    bool range = false;
};

template <typename Rule> struct control : pg::normal<Rule> {
    template <typename Input, typename... States>
    [[noreturn]] static void raise(const Input& in, States&&... /*unused*/) {
        constexpr const char* own = of::error_message<Rule>;
        throw workbook_error(fmt::format("{} (at character {})",
                                         own != nullptr ? own : "unexpected text",
                                         in.position().column));
    }
};

std::string unquote(std::string_view s) {
    if (s.size() < 2 || s.front() != '\'')
        return std::string(s);
    std::string out;
    for (std::size_t i = 1; i + 1 < s.size(); ++i) {
        out += s[i];
        if (s[i] == '\'' && s[i + 1] == '\'')
            ++i;
    }
    return out;
}

template <typename Rule> struct action : pg::nothing<Rule> {};

template <> struct action<of::sheet_name> {
    template <typename In> static void apply(const In& in, translation& t) {
        t.sheet = unquote(in.string_view());
    }
};
template <> struct action<of::location> {
    template <typename In> static void apply(const In& in, translation& t) {
        t.location = in.string();
    }
};
template <> struct action<of::cell_part> {
    template <typename In> static void apply(const In& /*in*/, translation& t) {
        if (t.first_location.empty()) {
            t.first_location = t.location;
            t.first_sheet = t.sheet;
        }
    }
};
template <> struct action<of::range_end> {
    template <typename In> static void apply(const In& /*in*/, translation& t) { t.range = true; }
};
template <> struct action<of::reference_body> {
    template <typename In> static void apply(const In& /*in*/, translation& t) {
        if (!t.first_sheet.empty())
            t.out += quoted_sheet_name(t.first_sheet) + "!";
        t.out += t.first_location;
        if (t.range)
            t.out += ":" + t.location;
        t.first_sheet.clear();
        t.sheet.clear();
        t.first_location.clear();
        t.location.clear();
        t.range = false;
    }
};
template <> struct action<of::string_literal> {
    template <typename In> static void apply(const In& in, translation& t) { t.out += in.string(); }
};
template <> struct action<of::separator> {
    template <typename In> static void apply(const In& /*in*/, translation& t) { t.out += ','; }
};
template <> struct action<of::other> {
    template <typename In> static void apply(const In& in, translation& t) { t.out += in.string(); }
};

} // namespace

std::string openformula_to_a1(std::string_view formula) {
    translation t;
    t.out = "=";
    pg::memory_input in(formula.data(), formula.size(), "formula");
    pg::parse<of::formula, action, control>(in, t);
    return t.out;
}

std::string openformula_address_to_a1(std::string_view address) {
    translation t;
    pg::memory_input in(address.data(), address.size(), "address");
    if (!pg::parse<of::address, action, control>(in, t))
        throw workbook_error(fmt::format("'{}' is not a cell range address", address));
    return t.out;
}

} // namespace plumb::sheets
