// The fuzz targets' oracle for JSON and UTF-8 (tests/fuzz/strict_json.cpp) must itself be
// right: examples of RFC 8259 (JSON) and RFC 3629 (UTF-8, Section 4's syntax and the
// overlong and surrogate cases of Section 10).
#include "fuzz/strict_json.hpp"

#include <doctest/doctest.h>

#include <string>

using plumb::fuzz::json_problem;
using plumb::fuzz::valid_utf8;

TEST_CASE("strict JSON: documents RFC 8259 allows") {
    for (const char* ok :
         {"{}", "[]", "0", "-0.5e+10", "\"a\"", " true ", "null", "[1,2,{\"a\":[false]}]",
          "{\"Image\":{\"Width\":800,\"IDs\":[116,943,234,38793]}}", "\"\\u00e9\\ud834\\udd1e\"",
          "\"\\\"\\\\\\/\\b\\f\\n\\r\\t\"", "\"\xC3\xA9\xE2\x82\xAC\xF0\x9D\x84\x9E\""}) {
        CAPTURE(ok);
        CHECK(json_problem(ok).empty());
    }
}

TEST_CASE("strict JSON: documents RFC 8259 forbids") {
    for (const char* bad : {"",
                            "{",
                            "[1,]",
                            "{\"a\":1,}",
                            "01",
                            "1.",
                            ".5",
                            "+1",
                            "1e",
                            "NaN",
                            "Infinity",
                            "'a'",
                            "{a:1}",
                            "[1 2]",
                            "\"a\nb\"",
                            "\"\\x41\"",
                            "\"\\u12G4\"",
                            "\"\\ud834\"",
                            "\"\\udd1e\"",
                            "{} {}",
                            "tru",
                            "\"\xC0\xAF\"",
                            "\"\xED\xA0\x80\"",
                            "\"\xF5\x80\x80\x80\""}) {
        CAPTURE(bad);
        CHECK_FALSE(json_problem(bad).empty());
    }
}

TEST_CASE("strict UTF-8: RFC 3629 sequences") {
    CHECK(valid_utf8("plain ASCII"));
    CHECK(valid_utf8("\xCE\xBC \xE2\x84\xAB \xF0\x9F\x98\x80")); // μ, Å, U+1F600
    CHECK(valid_utf8("\xEF\xBF\xBF\xF4\x8F\xBF\xBF"));           // U+FFFF, U+10FFFF
    CHECK_FALSE(valid_utf8("\xC0\x80"));                         // overlong NUL
    CHECK_FALSE(valid_utf8("\xE0\x80\xAF"));                     // overlong '/'
    CHECK_FALSE(valid_utf8("\xF0\x80\x80\xAF"));                 // overlong '/'
    CHECK_FALSE(valid_utf8("\xED\xA0\x80"));                     // surrogate U+D800
    CHECK_FALSE(valid_utf8("\xF4\x90\x80\x80"));                 // above U+10FFFF
    CHECK_FALSE(valid_utf8("\xF5\x80\x80\x80"));                 // byte F5
    CHECK_FALSE(valid_utf8("\xCE"));                             // truncated
    CHECK_FALSE(valid_utf8("\x80"));                             // lone continuation
}
