#include "fuzz_support.hpp"

#include "plumb/render.hpp"
#include "strict_json.hpp"

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <string>
#include <unistd.h>

namespace plumb::fuzz {

namespace fs = std::filesystem;

namespace {

// Dictionaries a fuzz input may `use`: small, and covering plain, offset and user units, and
// the barrels and gallons some rules search the formula for.
constexpr const char* fluids = "ρ : kg/m^3 \"density\"\nμ : Pa*s\nν : m^2/s\ng : m/s^2\n"
                               "V : m/s\nD : m\nL : m\nQ : m^3/s\np : Pa\nΔp : Pa\nf : 1\n";
constexpr const char* units = "measure ksi = 1000 psi\nmeasure kPag = kPa zero at 101.325 kPa\n"
                              "p_g : kPag\nσ : ksi\nQ_b : bbl/d\nQ_g : gpm\nT_w : gal/(d*ft)\n"
                              "s : ft\n";
constexpr const char* thermal = "use \"fluids.plumb\"\nT : °C\nΔT : Δ°C\nc_p : J/(kg*K)\n"
                                "k : W/(m*K)\nh : W/(m^2*K)\n";

fs::path make_sandbox() {
    std::string pattern = (fs::temp_directory_path() / "plumb-fuzz-XXXXXX").string();
    if (mkdtemp(pattern.data()) == nullptr)
        fail("cannot make the sandbox folder");
    const fs::path root(pattern);
    for (const auto& [name, text] :
         {std::pair{"fluids.plumb", fluids}, std::pair{"units.plumb", units},
          std::pair{"thermal.plumb", thermal}}) {
        std::ofstream out(root / name, std::ios::binary);
        out << text;
    }
    return root;
}

void check_place(const check_report& report, const location& where, std::string_view what) {
    if (where.file == nullptr)
        return;
    bool known = false;
    for (const auto& source : report.sources)
        known = known || source.get() == where.file;
    require(known, std::string(what) + " points into a file the report does not hold");
    require(where.range.begin <= where.range.end && where.range.end <= where.file->text().size(),
            std::string(what) + " has a range outside its text");
}

} // namespace

void fail(std::string_view what) {
    std::fprintf(stderr, "plumb fuzz: %.*s\n", static_cast<int>(what.size()), what.data());
    std::abort();
}

const fs::path& sandbox() {
    static const fs::path root = [] {
        fs::path made = make_sandbox();
        std::atexit([] {
            std::error_code ec;
            fs::remove_all(sandbox(), ec);
        });
        return made;
    }();
    return root;
}

check_options sandboxed_options() {
    check_options options;
    options.include_root = sandbox();
    options.record_formulas = true;
    options.record_side_dimensions = true;
    options.jobs = 1;
    return options;
}

void check_ranges(const check_report& report) {
    for (const auto& d : report.diagnostics) {
        check_place(report, d.where, "a finding");
        for (const auto& t : d.terms)
            check_place(report, t.where, "a finding's term");
        for (const auto& n : d.notes)
            check_place(report, n.where, "a finding's note");
        if (d.accepted)
            check_place(report, d.accepted->mark, "an acceptance mark");
    }
    for (const auto& f : report.formulas)
        check_place(report, f.where, "a formula record");
    for (const auto& s : report.studies)
        check_place(report, s.where, "a study");
}

void check_json(std::string_view json, std::string_view renderer) {
    const std::string problem = json_problem(json);
    if (!problem.empty())
        fail(std::string(renderer) + " wrote invalid JSON: " + problem);
}

void check_utf8(std::string_view output, std::string_view renderer) {
    require(valid_utf8(output), std::string(renderer) + " wrote invalid UTF-8");
}

void check_renderers(const check_report& report) {
    // Text output quotes the checked files as they are: it is valid UTF-8 when they are.
    // JSON, SARIF and HTML escape what they quote, so they must be valid whatever the input.
    const bool sources_valid =
        std::all_of(report.sources.begin(), report.sources.end(),
                    [](const auto& source) { return valid_utf8(source->text()); });
    const auto check_text_output = [&](std::string_view output, std::string_view renderer) {
        if (sources_valid)
            check_utf8(output, renderer);
    };
    check_text_output(render_text(report, {false}), "render_text");
    (void)render_text(report, {true});
    for (const auto& d : report.diagnostics)
        check_text_output(render_one_line(d), "render_one_line");
    check_text_output(render_quiet(report, severity::warning), "render_quiet");
    check_json(render_json(report), "render_json");
    check_json(render_sarif(report, sandbox()), "render_sarif");
    check_json(render_groups_json(report), "render_groups_json");
    check_text_output(render_groups_text(report, {false}), "render_groups_text");
    signoff_context context;
    context.paths_checked = {"fuzz.plumb"};
    context.checked_at = "2026-01-01T00:00:00Z";
    context.project_root = sandbox();
    check_utf8(render_signoff_html(report, context), "render_signoff_html");
}

} // namespace plumb::fuzz
