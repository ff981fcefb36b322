#include "strict_json.hpp"

#include <cstddef>
#include <cstdint>
#include <string>

namespace plumb::fuzz {

namespace {

// The length of the UTF-8 sequence at `i`, or 0 when it is not a valid one.
std::size_t utf8_sequence(std::string_view s, std::size_t i) {
    const auto byte = [&](std::size_t k) { return static_cast<unsigned char>(s[k]); };
    const unsigned char b0 = byte(i);
    if (b0 < 0x80)
        return 1;
    std::size_t length = 0;
    unsigned char low = 0x80, high = 0xBF; // bounds of the second byte (RFC 3629, Section 4)
    if (b0 >= 0xC2 && b0 <= 0xDF) {
        length = 2;
    } else if (b0 >= 0xE0 && b0 <= 0xEF) {
        length = 3;
        if (b0 == 0xE0)
            low = 0xA0; // no overlong three-byte forms
        if (b0 == 0xED)
            high = 0x9F; // no surrogates
    } else if (b0 >= 0xF0 && b0 <= 0xF4) {
        length = 4;
        if (b0 == 0xF0)
            low = 0x90; // no overlong four-byte forms
        if (b0 == 0xF4)
            high = 0x8F; // nothing above U+10FFFF
    } else {
        return 0;
    }
    if (i + length > s.size())
        return 0;
    if (byte(i + 1) < low || byte(i + 1) > high)
        return 0;
    for (std::size_t k = 2; k < length; ++k)
        if (byte(i + k) < 0x80 || byte(i + k) > 0xBF)
            return 0;
    return length;
}

class parser {
  public:
    explicit parser(std::string_view text) : s_(text) {}

    std::string run() {
        skip_space();
        if (!value(0))
            return problem_;
        skip_space();
        if (i_ != s_.size()) {
            fail("text after the document");
            return problem_;
        }
        return {};
    }

  private:
    std::string_view s_;
    std::size_t i_ = 0;
    std::string problem_;

    bool fail(const char* what) {
        if (problem_.empty())
            problem_ = std::string(what) + " at byte " + std::to_string(i_);
        return false;
    }
    [[nodiscard]] bool at_end() const { return i_ >= s_.size(); }
    [[nodiscard]] char peek() const { return s_[i_]; }

    void skip_space() {
        while (!at_end() && (peek() == ' ' || peek() == '\t' || peek() == '\n' || peek() == '\r'))
            ++i_;
    }

    bool literal(std::string_view word) {
        if (s_.substr(i_, word.size()) != word)
            return fail("unknown literal");
        i_ += word.size();
        return true;
    }

    bool value(int depth) {
        if (depth > 10000)
            return fail("nesting too deep");
        if (at_end())
            return fail("a value expected");
        switch (peek()) {
        case '{':
            return object(depth);
        case '[':
            return array(depth);
        case '"':
            return string();
        case 't':
            return literal("true");
        case 'f':
            return literal("false");
        case 'n':
            return literal("null");
        default:
            return number();
        }
    }

    bool object(int depth) {
        ++i_;
        skip_space();
        if (!at_end() && peek() == '}') {
            ++i_;
            return true;
        }
        for (;;) {
            skip_space();
            if (at_end() || peek() != '"')
                return fail("a member name expected");
            if (!string())
                return false;
            skip_space();
            if (at_end() || peek() != ':')
                return fail("':' expected");
            ++i_;
            skip_space();
            if (!value(depth + 1))
                return false;
            skip_space();
            if (at_end())
                return fail("unterminated object");
            if (peek() == '}') {
                ++i_;
                return true;
            }
            if (peek() != ',')
                return fail("',' or '}' expected");
            ++i_;
        }
    }

    bool array(int depth) {
        ++i_;
        skip_space();
        if (!at_end() && peek() == ']') {
            ++i_;
            return true;
        }
        for (;;) {
            skip_space();
            if (!value(depth + 1))
                return false;
            skip_space();
            if (at_end())
                return fail("unterminated array");
            if (peek() == ']') {
                ++i_;
                return true;
            }
            if (peek() != ',')
                return fail("',' or ']' expected");
            ++i_;
        }
    }

    bool hex4(std::uint32_t& out) {
        if (i_ + 4 > s_.size())
            return fail("short \\u escape");
        out = 0;
        for (int k = 0; k < 4; ++k) {
            const char c = s_[i_++];
            out <<= 4;
            if (c >= '0' && c <= '9')
                out |= static_cast<std::uint32_t>(c - '0');
            else if (c >= 'a' && c <= 'f')
                out |= static_cast<std::uint32_t>(c - 'a' + 10);
            else if (c >= 'A' && c <= 'F')
                out |= static_cast<std::uint32_t>(c - 'A' + 10);
            else
                return fail("bad hex digit in \\u escape");
        }
        return true;
    }

    bool string() {
        ++i_;
        for (;;) {
            if (at_end())
                return fail("unterminated string");
            const auto c = static_cast<unsigned char>(peek());
            if (c == '"') {
                ++i_;
                return true;
            }
            if (c < 0x20)
                return fail("unescaped control character in a string");
            if (c == '\\') {
                ++i_;
                if (at_end())
                    return fail("unterminated escape");
                const char e = s_[i_++];
                if (e == 'u') {
                    std::uint32_t unit = 0;
                    if (!hex4(unit))
                        return false;
                    if (unit >= 0xDC00 && unit <= 0xDFFF)
                        return fail("lone low surrogate escape");
                    if (unit >= 0xD800 && unit <= 0xDBFF) {
                        std::uint32_t low = 0;
                        if (s_.substr(i_, 2) != "\\u")
                            return fail("high surrogate escape without its low half");
                        i_ += 2;
                        if (!hex4(low))
                            return false;
                        if (low < 0xDC00 || low > 0xDFFF)
                            return fail("high surrogate escape without its low half");
                    }
                } else if (std::string_view("\"\\/bfnrt").find(e) == std::string_view::npos) {
                    return fail("unknown escape");
                }
                continue;
            }
            const std::size_t n = utf8_sequence(s_, i_);
            if (n == 0)
                return fail("invalid UTF-8 in a string");
            i_ += n;
        }
    }

    bool digits() {
        const std::size_t start = i_;
        while (!at_end() && peek() >= '0' && peek() <= '9')
            ++i_;
        return i_ > start;
    }

    bool number() {
        if (!at_end() && peek() == '-')
            ++i_;
        if (at_end())
            return fail("a value expected");
        if (peek() == '0') {
            ++i_;
        } else if (peek() >= '1' && peek() <= '9') {
            digits();
        } else {
            return fail("a value expected");
        }
        if (!at_end() && peek() == '.') {
            ++i_;
            if (!digits())
                return fail("digits expected after '.'");
        }
        if (!at_end() && (peek() == 'e' || peek() == 'E')) {
            ++i_;
            if (!at_end() && (peek() == '+' || peek() == '-'))
                ++i_;
            if (!digits())
                return fail("digits expected in the exponent");
        }
        return true;
    }
};

} // namespace

bool valid_utf8(std::string_view bytes) {
    for (std::size_t i = 0; i < bytes.size();) {
        const std::size_t n = utf8_sequence(bytes, i);
        if (n == 0)
            return false;
        i += n;
    }
    return true;
}

std::string json_problem(std::string_view text) {
    return parser(text).run();
}

} // namespace plumb::fuzz
