// Hand-written PEGTL rules for the leaves read at nearly every byte of a formula: a name, a
// number, a run of blanks and a comment, and the first test that tells a formula from a
// declaration. Each reads its whole run in one loop where the combinator form of the same rule
// went through a rule instantiation, a marker and a peek per byte (issue 12: parse speed). Each
// matches exactly what the combinator form in its comment matches, and none has a hard-error
// point, so no message or position depends on them.
#pragma once

#include <tao/pegtl.hpp>
#include <tao/pegtl/contrib/analyze_traits.hpp>

#include <array>
#include <cstddef>
#include <cstring>

namespace plumb::notation::leaves {

// What each byte can be in a name, a number or a run of blanks, looked up in one load.
enum byte_class : unsigned char {
    ascii_letter = 1,
    decimal_digit = 2,
    underscore = 4,
    blank = 8,        // ' ', '\t', '\r'
    line_joiner = 16, // '\', which may start a continuation
    high = 32,        // 0x80 and above: a byte of a multi-byte UTF-8 sequence
    list_mark = 64,   // '\'' and ',', which a declaration's head holds besides names and blanks
};
[[nodiscard]] constexpr std::array<unsigned char, 256> byte_classes() noexcept {
    std::array<unsigned char, 256> table{};
    for (std::size_t c = 'a'; c <= 'z'; ++c)
        table[c] = ascii_letter;
    for (std::size_t c = 'A'; c <= 'Z'; ++c)
        table[c] = ascii_letter;
    for (std::size_t c = '0'; c <= '9'; ++c)
        table[c] = decimal_digit;
    table['_'] = underscore;
    table[' '] = table['\t'] = table['\r'] = blank;
    table['\\'] = line_joiner;
    for (std::size_t c = 0x80; c < 256; ++c)
        table[c] = high;
    table['\''] = table[','] = list_mark;
    return table;
}
inline constexpr std::array<unsigned char, 256> byte_class_of = byte_classes();

[[nodiscard]] constexpr bool is(char c, unsigned classes) noexcept {
    return (byte_class_of[static_cast<unsigned char>(c)] & classes) != 0;
}

// The length of the letter that starts at p (a byte of 0x80 or above), or 0: the Latin-1 and
// Latin Extended letters without U+00D7 and U+00F7, the micro sign, Greek, Latin Extended
// Additional and Greek Extended.
// As PEGTL's utf8::ranges, it takes only well-formed, shortest sequences.
[[nodiscard]] inline std::size_t utf8_letter_length(const char* p, const char* end) noexcept {
    const auto c0 = static_cast<unsigned char>(*p);
    if ((c0 & 0xE0) == 0xC0) {
        if (end - p < 2)
            return 0;
        const auto c1 = static_cast<unsigned char>(p[1]);
        if ((c1 & 0xC0) != 0x80)
            return 0;
        const unsigned code = ((c0 & 0x1Fu) << 6) | (c1 & 0x3Fu);
        const bool letter = code == 0xB5 ||
                            (code >= 0xC0 && code <= 0x24F && code != 0xD7 && code != 0xF7) ||
                            (code >= 0x370 && code <= 0x3FF);
        return letter ? 2 : 0;
    }
    if ((c0 & 0xF0) == 0xE0) {
        if (end - p < 3)
            return 0;
        const auto c1 = static_cast<unsigned char>(p[1]);
        const auto c2 = static_cast<unsigned char>(p[2]);
        if ((c1 & 0xC0) != 0x80 || (c2 & 0xC0) != 0x80)
            return 0;
        const unsigned code = ((c0 & 0x0Fu) << 12) | ((c1 & 0x3Fu) << 6) | (c2 & 0x3Fu);
        return code >= 0x1E00 && code <= 0x1FFF ? 3 : 0;
    }
    return 0; // a four-byte sequence is above every letter's range
}

// The length of the combining mark (U+0300-U+036F) that starts at p, or 0: it may follow a
// name's first letter (Q̇, the dot written as a mark of its own).
[[nodiscard]] inline std::size_t utf8_combining_length(const char* p, const char* end) noexcept {
    if (end - p < 2)
        return 0;
    const auto c0 = static_cast<unsigned char>(p[0]);
    const auto c1 = static_cast<unsigned char>(p[1]);
    return (c0 == 0xCC && c1 >= 0x80 && c1 <= 0xBF) || (c0 == 0xCD && c1 >= 0x80 && c1 <= 0xAF) ? 2
                                                                                                : 0;
}

// Marks a hand-written rule, which a parser's control class may call directly where no action
// is attached to it. What PEGTL's analysis needs of it is here; how it consumes is told by the
// analyze_traits at the end of this file.
struct hand_written_rule {};
template <typename Rule> struct hand_written : hand_written_rule {
    using rule_t = Rule;
    using subs_t = tao::pegtl::empty_list;
};

} // namespace plumb::notation::leaves

namespace plumb::notation {

// seq<letter, star<name_char>, star<one<'\''>>>, where a letter is an ASCII letter or one of
// utf8_letter_length, and a name_char either of those, a digit, '_' or a combining mark.
struct name : leaves::hand_written<name> {
    template <typename Input> [[nodiscard]] static bool match(Input& in) noexcept {
        const char* p = in.current();
        const char* const end = in.end();
        if (p == end)
            return false;
        if (leaves::is(*p, leaves::ascii_letter)) {
            ++p;
        } else if (leaves::is(*p, leaves::high)) {
            const std::size_t n = leaves::utf8_letter_length(p, end);
            if (n == 0)
                return false;
            p += n;
        } else {
            return false;
        }
        while (p != end) {
            if (leaves::is(*p, leaves::ascii_letter | leaves::decimal_digit | leaves::underscore)) {
                ++p;
            } else if (leaves::is(*p, leaves::high)) {
                std::size_t n = leaves::utf8_letter_length(p, end);
                if (n == 0)
                    n = leaves::utf8_combining_length(p, end);
                if (n == 0)
                    break;
                p += n;
            } else {
                break;
            }
        }
        while (p != end && *p == '\'')
            ++p;
        in.bump(static_cast<std::size_t>(p - in.current()));
        return true;
    }
};

// seq<sor<seq<digits, opt<one<'.'>, star<digit>>>, seq<one<'.'>, digits>>,
//     opt<one<'e', 'E'>, opt<one<'+', '-'>>, digits>>
struct number : leaves::hand_written<number> {
    template <typename Input> [[nodiscard]] static bool match(Input& in) noexcept {
        const char* p = in.current();
        const char* const end = in.end();
        const auto skip_digits = [end](const char* q) {
            while (q != end && leaves::is(*q, leaves::decimal_digit))
                ++q;
            return q;
        };
        if (p != end && leaves::is(*p, leaves::decimal_digit)) {
            p = skip_digits(p + 1);
            if (p != end && *p == '.')
                p = skip_digits(p + 1);
        } else if (end - p >= 2 && *p == '.' && leaves::is(p[1], leaves::decimal_digit)) {
            p = skip_digits(p + 2);
        } else {
            return false;
        }
        if (p != end && (*p == 'e' || *p == 'E')) {
            const char* q = p + 1;
            if (q != end && (*q == '+' || *q == '-'))
                ++q;
            if (q != end && leaves::is(*q, leaves::decimal_digit))
                p = skip_digits(q + 1);
        }
        in.bump(static_cast<std::size_t>(p - in.current()));
        return true;
    }
};

// star<sor<space, continuation>>: blanks, and '\' with blanks and a comment up to the line
// break it continues over. A '\' not followed by that is left unread.
struct ws : leaves::hand_written<ws> {
    // Most places have no blank or one: those are read inline, a longer run out of line.
    template <typename Input> [[gnu::always_inline]] static bool match(Input& in) noexcept {
        const char* const p = in.current();
        const char* const end = in.end();
        if (p == end || !leaves::is(*p, leaves::blank | leaves::line_joiner))
            return true;
        // One blank before an operand or an operator is the commonest run of all.
        if (leaves::is(*p, leaves::blank) &&
            (p + 1 == end || !leaves::is(p[1], leaves::blank | leaves::line_joiner)))
            in.bump(1);
        else
            in.bump(static_cast<std::size_t>(skip(p, end) - p));
        return true;
    }
    [[gnu::noinline]] static const char* skip(const char* p, const char* const end) noexcept {
        while (p != end) {
            if (leaves::is(*p, leaves::blank)) {
                ++p;
                continue;
            }
            if (*p != '\\')
                break;
            const char* q = p + 1;
            while (q != end && leaves::is(*q, leaves::blank))
                ++q;
            if (q != end && *q == '#') {
                while (q != end && *q != '\n')
                    ++q;
            }
            if (q == end || *q != '\n')
                break;
            p = q + 1;
        }
        return p;
    }
};

// seq<one<'#'>, star<not_one<'\n'>>>: the rest of the line after '#', found with one search for
// the line break rather than a rule tried at each byte (a ninth of the bytes of a typical calc
// are comments).
struct comment : leaves::hand_written<comment> {
    template <typename Input> [[nodiscard]] static bool match(Input& in) noexcept {
        const char* const p = in.current();
        const char* const end = in.end();
        if (p == end || *p != '#')
            return false;
        const void* const line_break = std::memchr(p, '\n', static_cast<std::size_t>(end - p));
        const char* const stop = line_break != nullptr ? static_cast<const char*>(line_break) : end;
        in.bump(static_cast<std::size_t>(stop - p));
        return true;
    }
};

// at<star<one<' ', '\t', '\r'>>, one<'('>>: whether a '(' follows, past blanks, read without
// moving. It guards a call's arguments: their rule is recursive and so stays a function of its
// own, entered after every name only to fail at its first byte but at a call (issue 12).
struct call_ahead : leaves::hand_written<call_ahead> {
    template <typename Input>
    [[nodiscard, gnu::always_inline]] static bool match(Input& in) noexcept {
        const char* p = in.current();
        const char* const end = in.end();
        while (p != end && leaves::is(*p, leaves::blank))
            ++p;
        return p != end && *p == '(';
    }
};

// at<sor<digit, one<'.'>>>: whether a number may start here, read without moving. It guards the
// number term, whose rule holds a braced unit and so a recursive one: a function of its own,
// which an operand that is no number entered only to fail at its first byte (issue 12).
struct number_ahead : leaves::hand_written<number_ahead> {
    template <typename Input>
    [[nodiscard, gnu::always_inline]] static bool match(Input& in) noexcept {
        const char* const p = in.current();
        return p != in.end() && (leaves::is(*p, leaves::decimal_digit) || *p == '.');
    }
};

// seq<star<head_byte>, one<':', '\\'>>, where a head_byte is one of the bytes a declaration's
// names, commas and blanks are made of: an ASCII letter or digit, '_', '\'', a byte of a
// multi-byte UTF-8 sequence, ' ', '\t', '\r' or ','. A '\\' may start a continuation, whose
// comment holds anything, so it passes too.
struct declaration_head_bytes : leaves::hand_written<declaration_head_bytes> {
    template <typename Input> [[nodiscard]] static bool match(Input& in) noexcept {
        const char* p = in.current();
        const char* const end = in.end();
        constexpr unsigned head_byte = leaves::ascii_letter | leaves::decimal_digit |
                                       leaves::underscore | leaves::high | leaves::blank |
                                       leaves::list_mark;
        while (p != end && leaves::is(*p, head_byte))
            ++p;
        if (p == end || (*p != ':' && *p != '\\'))
            return false;
        in.bump(static_cast<std::size_t>(p + 1 - in.current()));
        return true;
    }
};

} // namespace plumb::notation

namespace tao::pegtl {
template <typename Name>
struct analyze_traits<Name, plumb::notation::name> : analyze_any_traits<> {};
template <typename Name>
struct analyze_traits<Name, plumb::notation::number> : analyze_any_traits<> {};
template <typename Name>
struct analyze_traits<Name, plumb::notation::comment> : analyze_any_traits<> {};
template <typename Name>
struct analyze_traits<Name, plumb::notation::call_ahead> : analyze_opt_traits<> {};
template <typename Name>
struct analyze_traits<Name, plumb::notation::number_ahead> : analyze_opt_traits<> {};
template <typename Name> struct analyze_traits<Name, plumb::notation::ws> : analyze_opt_traits<> {};
template <typename Name>
struct analyze_traits<Name, plumb::notation::declaration_head_bytes> : analyze_any_traits<> {};
} // namespace tao::pegtl
