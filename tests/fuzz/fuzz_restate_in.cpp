// `--restate-in`: the input is the option's value, split as the command line splits it. A
// set that is accepted must restate the coefficients of a file with `?` marks without harm.
#include "fuzz_support.hpp"
#include "strict_json.hpp"

#include <string>
#include <vector>

namespace {

// Commas and spaces separate the units, as in `--restate-in 'ft, lb, s'`.
std::vector<std::string> split_units(const std::string& value) {
    std::vector<std::string> out;
    std::string item;
    for (const char c : value + ",") {
        if (c == ',' || c == ' ') {
            if (!item.empty())
                out.push_back(item);
            item.clear();
        } else {
            item += c;
        }
    }
    return out;
}

constexpr const char* coefficients = "V : m/s\nR_h : m\nn : 1\nS : 1\nQ : m^3/s\nH : m\n"
                                     "L : m\nh_f : m\nC : 1\nD : m\n"
                                     "@manning V = 1.486?/n*R_h^(2/3)*S^(1/2)\n"
                                     "@weir Q = 3.33?*L*H^(3/2)\n"
                                     "@hazen h_f = 10.67?*L*Q^1.852/(C^1.852*D^4.87)\n";

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    try {
        auto options = sandboxed_options();
        options.restate_in = split_units(as_text(data, size));
        if (const auto problem = plumb::restate_units_problem(options.restate_in)) {
            require(!problem->empty(), "a refused --restate-in set without a reason");
            // The reason quotes the units as given: valid UTF-8 when they are.
            if (valid_utf8(as_text(data, size)))
                check_utf8(*problem, "restate_units_problem");
            return 0;
        }
        check_everything(plumb::check_text("fuzz.plumb", coefficients, options));
    } catch (...) {
        fail("restating coefficients threw an exception");
    }
    return 0;
}
