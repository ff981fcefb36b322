// Generated inputs that once took one pass seconds to minutes (issue 12, defects 3 and 6): each
// must complete and give the right finding. No timing is asserted; ctest's timeout catches a
// pass that is slow again, and plumb_bench_hostile prints the times at full size.
#include "hostile_inputs.hpp"

#include "plumb/check.hpp"
#include "plumb/groups.hpp"
#include "plumb/render.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string>
#include <string_view>

namespace {

std::size_t count_rule(const plumb::check_report& r, std::string_view rule) {
    return static_cast<std::size_t>(std::count_if(r.diagnostics.begin(), r.diagnostics.end(),
                                                  [&](const auto& d) { return d.rule == rule; }));
}

const plumb::diagnostic* first_with_rule(const plumb::check_report& r, std::string_view rule) {
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            return &d;
    return nullptr;
}

bool has_note(const plumb::diagnostic& d, std::string_view words) {
    return std::any_of(d.notes.begin(), d.notes.end(), [&](const plumb::note& n) {
        return n.message.find(words) != std::string::npos;
    });
}

} // namespace

TEST_CASE("two long names: the near miss is still suggested") {
    const std::size_t length = 100'000;
    const auto r = plumb::check_text("long.plumb", plumb::hostile::long_names(length));
    const plumb::diagnostic* d = first_with_rule(r, "undeclared");
    REQUIRE(d != nullptr);
    CHECK(has_note(*d, "did you mean '" + std::string(length, 'a') + "'?"));
}

TEST_CASE("hundreds of undeclared near misses each get their suggestion") {
    const std::size_t count = 300;
    const auto r = plumb::check_text("near.plumb", plumb::hostile::many_near_misses(count));
    CHECK(count_rule(r, "undeclared") == count);
    const plumb::diagnostic* first = first_with_rule(r, "undeclared");
    REQUIRE(first != nullptr);
    CHECK(first->message == "'nome_0_x' is not declared");
    CHECK(has_note(*first, "did you mean 'name_0_x',"));
    const plumb::diagnostic& last = r.diagnostics.back();
    CHECK(last.message == "'nome_299_x' is not declared");
    CHECK(has_note(last, "did you mean 'name_299_x',"));
}

TEST_CASE("past the budget of name comparisons, findings say suggestions stopped") {
    // 20 002 names per search: the budget of 5 000 000 comparisons lasts 249 searches.
    const std::size_t queries = 260;
    const auto r =
        plumb::check_text("near.plumb", plumb::hostile::near_misses_past_budget(20'000, queries));
    REQUIRE(count_rule(r, "undeclared") == queries);
    const plumb::diagnostic* first = first_with_rule(r, "undeclared");
    CHECK(first->message == "'q0' is not declared");
    CHECK(has_note(*first, "did you mean 'q0_x'?"));
    CHECK_FALSE(has_note(*first, "no longer looked for"));
    std::size_t cut = 0;
    for (const auto& d : r.diagnostics)
        if (d.rule == "undeclared" && has_note(d, "similar names are no longer looked for"))
            ++cut;
    CHECK(cut == queries - 249);
}

TEST_CASE("a sum of terms of thousands of dimensions: the odd ones are those unlike the first") {
    const std::size_t count = 20'000;
    const auto r = plumb::check_text("sum.plumb", plumb::hostile::distinct_dimensions_sum(count));
    REQUIRE(count_rule(r, "sum-mismatch") == 1);
    const plumb::diagnostic* d = first_with_rule(r, "sum-mismatch");
    // Every dimension occurs once, so the first term's is taken as the sum's, and x^2 is the
    // first that differs.
    CHECK(d->message == "'x^2' does not have the dimension of the other terms of this sum");
    CHECK(has_note(*d, "and " + std::to_string(count - 1 - 32) + " more that differ"));
}

TEST_CASE("a sum with tens of thousands of odd terms is explained in bounded words") {
    const std::size_t count = 100'000;
    const auto r = plumb::check_text("odd.plumb", plumb::hostile::half_odd_sum(count));
    REQUIRE(count_rule(r, "sum-mismatch") == 1);
    const plumb::diagnostic* d = first_with_rule(r, "sum-mismatch");
    // a is the first term; 50 000 a and 50 000 b: the tie goes to the first, so b is odd.
    CHECK(d->message == "'b' does not have the dimension of the other terms of this sum");
    CHECK(has_note(*d, "and " + std::to_string(count / 2 - 32) + " more that differ"));
    CHECK(d->terms.size() == 32 + 8); // every odd one up to 32, agreeing ones up to 8
}

TEST_CASE("thousands of findings on one line are each rendered with their excerpt") {
    const std::size_t count = 5000;
    const auto r = plumb::check_text("line.plumb", plumb::hostile::findings_on_one_line(count));
    const std::size_t findings = r.diagnostics.size();
    CHECK(findings >= count);
    const std::string text = plumb::render_text(r, {});
    // The last ln(a) starts at column 5 + 8 * (count - 1) of line 3, its argument 3 further.
    const std::string last_place = "line.plumb:3:" + std::to_string(5 + 8 * (count - 1) + 3) + ":";
    CHECK(text.find(last_place) != std::string::npos);
    CHECK(text.find("…") != std::string::npos); // a window of the long line, cut
}

TEST_CASE("a chain of many relations on one line: one finding, explained in bounded words") {
    const std::size_t count = 20'000;
    const auto r = plumb::check_text("chain.plumb", plumb::hostile::relation_chain(count));
    REQUIRE(count_rule(r, "side-mismatch") == 1);
    const plumb::diagnostic* d = first_with_rule(r, "side-mismatch");
    CHECK(d->message == "the sides of this equation differ in dimension");
    // a = a = b = ...: 10 001 sides a, 10 000 sides b; the first b is the third side.
    CHECK(has_note(*d, "and " + std::to_string(count / 2 - 32) + " more that differ"));
    CHECK(d->terms.size() == 32 + 8);
    const std::string text = plumb::render_text(r, {});
    CHECK(text.find("chain.plumb:3:9:") != std::string::npos);
    CHECK(plumb::render_json(r).find("\"side-mismatch\"") != std::string::npos);
}

TEST_CASE("symbols to infer tied in a long chain: solved up to the cap, reported past it") {
    SUBCASE("under the cap every one is inferred") {
        const std::size_t count = 120;
        const auto r = plumb::check_text("infer.plumb", plumb::hostile::inference_chain(count));
        const plumb::diagnostic* d = first_with_rule(r, "inferred-dimension");
        REQUIRE(d != nullptr);
        CHECK(d->message.find("'x0'") != std::string::npos);
        CHECK(d->message.find("[L^120]") != std::string::npos); // x0 = L^120
        for (const auto& finding : r.diagnostics)
            CHECK(finding.message.find("not inferred") == std::string::npos);
    }
    SUBCASE("past the cap each is reported as not inferred, with the reason") {
        const std::size_t count = 501;
        const auto r = plumb::check_text("infer.plumb", plumb::hostile::inference_chain(count));
        CHECK(count_rule(r, "inferred-dimension") == count);
        const plumb::diagnostic* d = first_with_rule(r, "inferred-dimension");
        REQUIRE(d != nullptr);
        CHECK(d->message ==
              "the dimension of 'x0' is not inferred: the formulas tie it to 500 other unknowns, "
              "more than the 500 that plumb solves together");
        CHECK(d->level == plumb::severity::warning);
    }
}

TEST_CASE("tens of thousands of units of the file's own are each found") {
    const std::size_t count = 10'000;
    const std::string units = plumb::hostile::many_units(count);
    // q is in u9999, 10 000 m; p is in m: the sides agree in dimension, not in unit.
    const auto r = plumb::check_text("units.plumb", units);
    REQUIRE(r.diagnostics.size() == 1);
    CHECK(r.diagnostics.front().rule == "unit-scale");
    CHECK(has_note(r.diagnostics.front(), "multiply 'q' by 10000"));
    const auto same = plumb::check_text("units.plumb", units + "w : u9999\nw = q\n");
    CHECK(count_rule(same, "unit-scale") == 1); // only p = q
    const auto wrong = plumb::check_text("units.plumb", units + "t : s\nt = q\n");
    CHECK(count_rule(wrong, "side-mismatch") == 1);
}

TEST_CASE("a study of hundreds of variables is worked out, and naming cut short says so") {
    const std::size_t count = 200;
    const auto r = plumb::check_text("study.plumb", plumb::hostile::large_study(count));
    REQUIRE(r.studies.size() == 1);
    const plumb::group_analysis& a = r.studies.front().analysis;
    REQUIRE(a.problems.empty());
    CHECK(a.rank == 3);
    CHECK(a.groups.size() == count - 3);
    REQUIRE(a.notes.size() == 1);
    CHECK(a.notes.front().find("with 197 groups") != std::string::npos);
    // 2500 pairs at 197 per group searched; groups already named cost nothing.
    CHECK(a.notes.front().find("π1 to π23 only") != std::string::npos);
    CHECK(a.groups[12].name == "Reynolds number"); // π13, recombined within the search
    CHECK_FALSE(a.groups[12].recombined_from.empty());
    const std::string text = plumb::render_groups_text(r, {});
    CHECK(text.find("  note: named numbers were sought") != std::string::npos);
}

TEST_CASE("a study past the size limit is a problem, not an hour of work") {
    const auto r = plumb::check_text("study.plumb",
                                     plumb::hostile::large_study(plumb::max_study_variables + 1));
    REQUIRE(r.studies.size() == 1);
    REQUIRE(r.studies.front().analysis.problems.size() == 1);
    CHECK(r.studies.front().analysis.problems.front() ==
          "the study has 1001 variables, more than the 1000 whose groups plumb works out; split "
          "it into studies of the variables that act together");
}
