// Helpers shared by the test files: a scratch folder that cleans up after itself.
#pragma once

#include "plumb/check.hpp"
#include "plumb/dimension.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string_view>

#include <chrono>
#include <cstdint>
#include <filesystem>
#include <fstream>
#include <initializer_list>
#include <string>
#include <system_error>
#include <vector>

namespace plumb::test {

// How many findings of a report are under `rule`.
inline std::size_t count_of(const check_report& r, std::string_view rule) {
    return static_cast<std::size_t>(std::count_if(r.diagnostics.begin(), r.diagnostics.end(),
                                                  [&](const auto& d) { return d.rule == rule; }));
}

// The errors and warnings of a report, less unused declarations: what a formula that should
// pass must not have.
inline std::size_t problems_in(const check_report& r) {
    return static_cast<std::size_t>(
        std::count_if(r.diagnostics.begin(), r.diagnostics.end(), [](const auto& d) {
            return d.level != severity::note && d.rule != rules::unused;
        }));
}

// One formula checked after the declarations it needs.
inline check_report check_after(const std::string& declarations, const char* formula) {
    return check_text("t.plumb", declarations + formula + "\n");
}

// Each formula, after the declarations, has at least one finding under `rule`.
inline void each_fails_with(const std::string& declarations,
                            std::initializer_list<const char*> formulas, std::string_view rule) {
    for (const char* formula : formulas) {
        CAPTURE(formula);
        CHECK(count_of(check_after(declarations, formula), rule) >= 1);
    }
}

// Each formula, after the declarations, passes: no error and no warning.
inline void each_passes(const std::string& declarations,
                        std::initializer_list<const char*> formulas) {
    for (const char* formula : formulas) {
        CAPTURE(formula);
        CHECK(problems_in(check_after(declarations, formula)) == 0);
    }
}

// Whether the finding or one of its notes says `words`.
inline bool says(const diagnostic& d, std::string_view words) {
    if (d.message.find(words) != std::string::npos)
        return true;
    return std::any_of(d.notes.begin(), d.notes.end(),
                       [&](const auto& n) { return n.message.find(words) != std::string::npos; });
}

// The report's first finding under `rule`; fails the test when there is none.
inline const diagnostic& first_under(const check_report& r, std::string_view rule) {
    const auto found = std::find_if(r.diagnostics.begin(), r.diagnostics.end(),
                                    [&](const auto& d) { return d.rule == rule; });
    REQUIRE(found != r.diagnostics.end());
    return *found;
}

// A dimension from whole exponents typed in the order M L T Θ N I J: the reference side of a
// comparison, built without the algebra under test.
inline dimension typed(std::int64_t m, std::int64_t l, std::int64_t t, std::int64_t th = 0,
                       std::int64_t n = 0, std::int64_t i = 0, std::int64_t j = 0) {
    return dimension::from_exponents({rational(m), rational(l), rational(t), rational(th),
                                      rational(n), rational(i), rational(j)});
}

struct unit_in_base_units {
    const char* symbol;
    dimension dim;
};

// SI Brochure 9th ed., Table 4: the 22 derived units with special names, in the column
// "expressed in terms of SI base units".
inline const std::vector<unit_in_base_units>& si_derived_units() {
    static const std::vector<unit_in_base_units> table = {
        {"rad", typed(0, 0, 0)},               // m/m
        {"sr", typed(0, 0, 0)},                // m²/m²
        {"Hz", typed(0, 0, -1)},               // s^-1
        {"N", typed(1, 1, -2)},                // kg m s^-2
        {"Pa", typed(1, -1, -2)},              // kg m^-1 s^-2
        {"J", typed(1, 2, -2)},                // kg m² s^-2
        {"W", typed(1, 2, -3)},                // kg m² s^-3
        {"C", typed(0, 0, 1, 0, 0, 1)},        // A s
        {"V", typed(1, 2, -3, 0, 0, -1)},      // kg m² s^-3 A^-1
        {"F", typed(-1, -2, 4, 0, 0, 2)},      // kg^-1 m^-2 s^4 A²
        {"\u03A9", typed(1, 2, -3, 0, 0, -2)}, // kg m² s^-3 A^-2
        {"S", typed(-1, -2, 3, 0, 0, 2)},      // kg^-1 m^-2 s³ A²
        {"Wb", typed(1, 2, -2, 0, 0, -1)},     // kg m² s^-2 A^-1
        {"T", typed(1, 0, -2, 0, 0, -1)},      // kg s^-2 A^-1
        {"H", typed(1, 2, -2, 0, 0, -2)},      // kg m² s^-2 A^-2
        {"\u00B0C", typed(0, 0, 0, 1)},        // K
        {"lm", typed(0, 0, 0, 0, 0, 0, 1)},    // cd sr = cd
        {"lx", typed(0, -2, 0, 0, 0, 0, 1)},   // cd sr m^-2 = cd m^-2
        {"Bq", typed(0, 0, -1)},               // s^-1
        {"Gy", typed(0, 2, -2)},               // m² s^-2
        {"Sv", typed(0, 2, -2)},               // m² s^-2
        {"kat", typed(0, 0, -1, 0, 1)},        // mol s^-1
    };
    return table;
}

// A fresh folder under the system's temporary directory, removed with everything in it.
class temp_dir {
  public:
    temp_dir() {
        static int counter = 0;
        const auto stamp = std::chrono::steady_clock::now().time_since_epoch().count();
        path_ = std::filesystem::temp_directory_path() /
                ("plumb-test-" + std::to_string(stamp) + "-" + std::to_string(++counter));
        std::filesystem::create_directories(path_);
    }
    ~temp_dir() {
        std::error_code ec;
        std::filesystem::remove_all(path_, ec);
    }
    temp_dir(const temp_dir&) = delete;
    temp_dir& operator=(const temp_dir&) = delete;

    [[nodiscard]] const std::filesystem::path& path() const { return path_; }

    // Writes `text` to `name` (folders created as needed) and returns the file's path.
    std::filesystem::path write(const std::string& name, const std::string& text) const {
        const std::filesystem::path file = path_ / name;
        std::filesystem::create_directories(file.parent_path());
        std::ofstream out(file, std::ios::binary);
        out << text;
        return file;
    }

  private:
    std::filesystem::path path_;
};

} // namespace plumb::test
