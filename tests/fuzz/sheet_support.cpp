#include "sheet_support.hpp"

#include "fuzz_support.hpp"
#include "sheets/workbook_checker.hpp"

#include <string>

namespace plumb::fuzz {

namespace {

sheets::workbook base_book() {
    using sheets::cell;
    using sheets::cell_kind;
    sheets::workbook book;
    sheets::sheet main;
    main.name = "Duty";
    const char* headings[] = {"Flow [m3/s]", "Bore (mm)", "Speed [m/s]", "Head (m)", "Result"};
    for (std::uint32_t c = 0; c < 5; ++c)
        main.add(cell{{0, c}, cell_kind::text, headings[c]});
    for (std::uint32_t r = 1; r < 6; ++r)
        for (std::uint32_t c = 0; c < 4; ++c)
            main.add(cell{{r, c}, cell_kind::number, std::to_string(r * 3 + c + 1)});
    sheets::sheet data;
    data.name = "Pump data";
    data.add(cell{{0, 0}, cell_kind::text, "Gravity [m/s2]"});
    data.add(cell{{1, 0}, cell_kind::number, "9.81"});
    data.add(cell{{2, 0}, cell_kind::boolean, "1"});
    data.add(cell{{3, 0}, cell_kind::error, "#DIV/0!"});
    book.sheets.push_back(std::move(main));
    book.sheets.push_back(std::move(data));
    book.names.push_back({"G", "'Pump data'!$A$2", std::nullopt});
    book.names.push_back({"Flows", "Duty!$A$2:$A$6", std::size_t{0}});
    return book;
}

} // namespace

std::vector<std::string> lines_of(const std::string& text, std::size_t limit) {
    std::vector<std::string> out;
    std::size_t begin = 0;
    while (begin <= text.size() && out.size() < limit) {
        std::size_t end = text.find('\n', begin);
        if (end == std::string::npos)
            end = text.size();
        out.push_back(text.substr(begin, end - begin));
        begin = end + 1;
    }
    return out;
}

void check_formulas_in_workbook(const std::vector<std::string>& formulas) {
    sheets::workbook book = base_book();
    sheets::sheet& main = book.sheets.front();
    std::uint32_t row = 1;
    for (const auto& f : formulas)
        main.add(sheets::cell{
            {row++, 4}, sheets::cell_kind::formula, !f.empty() && f.front() == '=' ? f : "=" + f});
    sheets::outside_units units;
    if (auto g = sheets::read_unit_text("m/s2"))
        units.names.emplace("G", sheets::declared_unit{*g, "the fuzz dictionary"});
    check_report report;
    sheets::check_workbook(book, "fuzz.xlsx", units, report);
    check_everything(report);
}

} // namespace plumb::fuzz
