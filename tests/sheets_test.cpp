// Workbooks: the A1 and OpenFormula grammars, unit texts as engineers type them, the
// spreadsheet's operator precedence, and files that must be refused with a plain message.
#include "check/formula_checker.hpp"
#include "plumb/a1_formula.hpp"
#include "plumb/check.hpp"
#include "plumb/openformula.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "sheets/a1_front_end.hpp"
#include "sheets/readers.hpp"
#include "sheets/shared_formula.hpp"
#include "sheets/unit_text.hpp"
#include "test_support.hpp"
#include "workbook_support.hpp"

#include <algorithm>
#include <doctest/doctest.h>
#include <fstream>
#include <tao/pegtl/contrib/analyze.hpp>
#include <zip.h>

using namespace plumb;
using namespace plumb::sheets;
using plumb::test::cell_findings_of_one_sheet;
using plumb::test::make_zip;
using plumb::test::value_and_unit_row;
using plumb::test::xlsx_of_one_sheet;

namespace {

std::string refusal(const std::string& bytes, std::string_view name, read_limits limits = {}) {
    try {
        (void)read_workbook(bytes, name, limits);
    } catch (const workbook_error& e) {
        return e.what();
    }
    return "";
}

const char* ods_mimetype = "application/vnd.oasis.opendocument.spreadsheet";

std::string ods_with_content(const std::string& content) {
    return make_zip({{"mimetype", ods_mimetype}, {"content.xml", content}});
}

std::string read_corpus(const std::string& name) {
    std::ifstream in(std::string(PLUMB_SOURCE_DIR) + "/corpus/sheets/" + name, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

} // namespace

TEST_CASE("sheets: the A1 and OpenFormula grammars have no PEGTL analysis issues") {
    CHECK(tao::pegtl::analyze<plumb::a1::formula>() == 0);
    CHECK(tao::pegtl::analyze<plumb::openformula::formula>() == 0);
}

TEST_CASE("sheets: OpenFormula references become A1 references (ODF 1.2 Part 2, 5.8)") {
    CHECK(openformula_to_a1("of:=[.C42]+[$Sheet2.A1]") == "=C42+Sheet2!A1");
    CHECK(openformula_to_a1("of:=SUM([.A1:.B5];2)") == "=SUM(A1:B5,2)");
    CHECK(openformula_to_a1("of:=[$'Pump data'.$C$4]*2") == "='Pump data'!$C$4*2");
    CHECK(openformula_to_a1("of:=IF([.A1]>0;\"a;b\";[.B1])") == "=IF(A1>0,\"a;b\",B1)");
    CHECK_THROWS_AS(openformula_to_a1("of:=[.A1"), workbook_error);
    CHECK(openformula_address_to_a1("$Inputs.$C$3") == "Inputs!$C$3");
}

TEST_CASE("sheets: unit texts read the way engineers type them") {
    // SI Brochure 9th ed., Table 8: litre = 10^-3 m^3; Table 7: milli = 10^-3.
    const auto flow = read_unit_text("m3/s");
    REQUIRE(flow);
    CHECK(flow->dim == plumb::test::typed(0, 3, -1));
    CHECK(read_unit_text("L/s")->scale == doctest::Approx(1e-3));
    CHECK(read_unit_text("mm4")->dim == plumb::test::typed(0, 4, 0));
    CHECK(read_unit_text("mm4")->scale == doctest::Approx(1e-12));
    CHECK(read_unit_text("m\u00B2")->dim == plumb::test::typed(0, 2, 0));
    CHECK(read_unit_text("kg/m\u00B3")->dim == plumb::test::typed(1, -3, 0));
    CHECK(read_unit_text("W/(m\u00B7K)")->dim == plumb::test::typed(1, 1, -3, -1));
    CHECK(read_unit_text("N\u00B7m")->dim == plumb::test::typed(1, 2, -2));
    CHECK(read_unit_text("mm/h")->dim == plumb::test::typed(0, 1, -1)); // h is the hour here
    CHECK(read_unit_text("%")->scale == doctest::Approx(0.01));
    for (const char* none : {"-", "1", "\u2014"})
        CHECK(read_unit_text(none)->dim.is_dimensionless());
    // Gauge: read against the standard atmosphere, 101 325 Pa (common practice).
    for (const char* gauge : {"kPa(g)", "kPa g", "kPag", "psig", "barg"}) {
        const auto u = read_unit_text(gauge);
        REQUIRE_MESSAGE(u, gauge);
        REQUIRE(u->offset != nullptr);
        CHECK(u->offset->scale == unit_scale::gauge);
    }
    CHECK(read_unit_text("kPa")->offset == nullptr);
    REQUIRE(read_unit_text("\u00B0C"));
    CHECK(read_unit_text("\u00B0C")->offset != nullptr);
    // A Celsius difference is a kelvin (SI Brochure 9th ed., 2.3.1).
    CHECK(read_unit_text("\u0394\u00B0C")->offset == nullptr);
    CHECK_FALSE(read_unit_text("Flow rate"));
    CHECK_FALSE(read_unit_text("OK"));
    // A pipe's nominal size typed right of its flow, as hydraulic calc forms print it, is a
    // size, not the flow's unit (common practice); a reciprocal unit still reads.
    for (const char* size : {"1 in", "2 in", "1.5 in", "25 mm"})
        CHECK_FALSE_MESSAGE(read_unit_text(size), size);
    CHECK(read_unit_text("1/s")->dim == plumb::test::typed(0, 0, -1));
    CHECK(read_unit_text("1/min")->scale == doctest::Approx(1.0 / 60.0));
    CHECK(read_heading_unit("Flow [m3/s]")->dim == plumb::test::typed(0, 3, -1));
    CHECK(read_heading_unit("D (mm)")->scale == doctest::Approx(1e-3));
    CHECK(read_heading_unit("cp [kJ/(kg\u00B7K)]")->dim == plumb::test::typed(0, 2, -2, -1));
    CHECK_FALSE(read_heading_unit("Flow rate (design)"));
    // Tables print a loss per a round length: NEC ch. 9, Table 9, "ohms to neutral per 1000
    // feet"; friction loss in psi per 100 ft (from memory). 1 ft = 0.3048 m (NIST SP 811
    // (2008), B.8).
    const auto ohms = read_heading_unit("Z [\u03A9/1000 ft]");
    REQUIRE(ohms);
    CHECK(ohms->scale == doctest::Approx(1.0 / 304.8));
    const auto friction = read_unit_text("psi/100 ft");
    REQUIRE(friction);
    CHECK(friction->dim == plumb::test::typed(1, -2, -2));
    CHECK(friction->scale == doctest::Approx(6894.757 / 30.48));
    CHECK(read_unit_text("m/100 m")->dim.is_dimensionless());
    CHECK_FALSE(read_unit_text("psi/250 ft"));
    // Units as the trades type them beside cells (common practice), read as the notation's.
    const auto same = [](const std::string& typed, const char* unit) {
        CAPTURE(typed);
        const auto a = read_unit_text(typed);
        const auto b = read_unit_text(unit);
        REQUIRE(a);
        REQUIRE(b);
        CHECK(a->dim == b->dim);
        CHECK(a->scale == doctest::Approx(b->scale));
        CHECK((a->offset == nullptr) == (b->offset == nullptr));
    };
    same("inH2O", "inH2O");
    same("in. w.g.", "inH2O");
    same("in wg", "inH2O");
    same("Btu/hr", "Btu/h");
    same("lb/hr", "lb/h");
    same("CFM", "cfm");
    same("FPM", "fpm");
    same("bara", "bar");
    same("kNm", "kN*m");
    same("kN-m", "kN*m");
    same("bhp", "hp");
    same("sq ft", "ft^2");
    same("BPD", "bbl/d");
    same("W/m\u00B2K", "W/(m^2*K)");
    same("W/m2K", "W/(m^2*K)");
    same("kJ/kg.K", "kJ/(kg*K)");
    // The I-P handbooks' U-value, Btu/(h·ft²·°F), printed without brackets (ASHRAE Handbook,
    // Fundamentals, I-P edition, from memory); 5.678 W/(m²·K) each (NIST SP 811 (2008), B.8).
    same("Btu/h\u00B7ft\u00B2\u00B7\u00B0F", "Btu/(h*ft^2*degR)");
    same("W/m\u00B2\u00B7K", "W/(m^2*K)");
    // The US gallon named as such (NIST SP 811 (2008), B.8, "gallon (U.S.)").
    same("US gal", "gal");
    // ... and inside a longer unit, as recovery and fuel rows write it.
    same("US gal/h", "gal/h");
    same("Btu/US gal", "Btu/gal");
    same("US gallon/h", "gal/h");
    same("US gallons", "gal");
    same("US gpm", "gpm");
    // The millimetre of water of a fan's or a filter's data sheet, 9.80665 Pa (NIST SP 811
    // (2008), B.8), and a humidity ratio in grains per pound (7000 gr to the lb, ibid.).
    same("mm w.g.", "mmH2O");
    same("mmWC", "mmH2O");
    same("mm H2O", "mmH2O");
    same("grains/lb", "gr/lb");
    CHECK(read_unit_text("mm w.g.")->scale == doctest::Approx(9.80665));
    CHECK(read_unit_text("grains/lb")->scale == doctest::Approx(1.0 / 7000.0));
    // A share by mass or volume, as the chemical trades head it (common practice).
    same("% w/w", "%");
    same("wt%", "%");
    same("% by weight", "%");
    same("% v/v", "%");
    // The inch of water column as gas and fan sheets type it; "g" or "gauge" beside it says
    // the gauge reading (NIST SP 811 (2008), B.8: 249.08891 Pa).
    same("\"w.c.", "inH2O");
    same("\"WC", "inH2O");
    same("in w.c.", "inH2O");
    same("in. w.c. (g)", "inH2Og");
    same("in. w.c. gauge", "inH2Og");
    // A duct's friction rate per a round length (ASHRAE Fundamentals, duct design, from
    // memory), with the inch of water spelled as the trades spell it.
    same("in. w.g./100 ft", "inH2O/100 ft");
    same("in. w.g. per 100 ft", "inH2O/100 ft");
    same("gal (US)", "gal");
    same("gallons", "gal");
    // The gas trades' normal and standard cubic metres (DIN 1343, ISO 13443; from memory), one
    // symbol each however the 3 is typed, never newton metres cubed.
    same("Nm\u00B3", "Nm3");
    same("kg/Nm\u00B3", "kg/m^3");
    same("kg/Nm3", "kg/m^3");
    same("Sm\u00B3/d", "m^3/d");
    same("MJ/Nm3", "MJ/m^3");
    // Moments as US drawings write them, the pound a pound-force and k the kip (common
    // practice; AISC's tables head them kip-ft).
    same("kip-ft", "kip*ft");
    same("k-ft", "kip*ft");
    same("lb-ft", "lbf*ft");
    same("ft-lb", "lbf*ft");
    same("in-lb", "lbf*in");
    // Per ton of refrigeration, 12 000 Btu/h (NIST SP 811 (2008), B.8), in chiller sheets.
    same("kW/ton", "kW/TR");
    same("gpm/ton", "gpm/TR");
    same("acres", "acre");
    same("days", "d");
    CHECK_FALSE(read_unit_text("hrs"));
    // A column of temperature differences headed in the scale's unit holds differences (a
    // Fahrenheit degree is 5/9 K, NIST SP 811 (2008), B.9); a heading that names a reading does
    // not, nor one whose first word only begins with a d.
    for (const char* heading :
         {"\u0394T [\u00B0F]", "dT (\u00B0F)", "CW \u0394T [\u00B0F]", "Temperature rise [\u00B0F]",
          "Supply-return difference (\u00B0F)"}) {
        CAPTURE(heading);
        const auto u = read_heading_unit(heading);
        REQUIRE(u);
        CHECK(u->offset == nullptr);
        CHECK(u->scale == doctest::Approx(5.0 / 9.0));
    }
    for (const char* heading :
         {"Supply [\u00B0F]", "Design temperature (\u00B0C)", "dry bulb [\u00B0F]"}) {
        CAPTURE(heading);
        const auto u = read_heading_unit(heading);
        REQUIRE(u);
        CHECK(u->offset != nullptr);
    }
}

TEST_CASE("sheets: unary minus binds tighter than ^, and % is a postfix operator") {
    // ECMA-376 Part 1, 18.17.2.2: negation before percent before exponentiation.
    workbook wb;
    wb.sheets.push_back({"S", {}, {}});
    const std::string text = "=-2^2\n=A1*5%\n=2^3^2\n100\n";
    const source_file src("t", text);
    lowered_book book;
    book.tree.source = &src;
    const span hundred{static_cast<std::uint32_t>(text.size() - 4),
                       static_cast<std::uint32_t>(text.size() - 1)};
    const auto a = lower_formula(book, wb, 0, 0, 5, hundred);
    REQUIRE(a.formula != syntax::no_index);
    const auto& root =
        book.tree.nodes[book.tree.sides[book.tree.formulas[a.formula].first_side].root];
    CHECK(root.kind == syntax::expr_kind::power);
    CHECK(book.tree.nodes[root.lhs].kind == syntax::expr_kind::negate);
    const auto b = lower_formula(book, wb, 0, 6, 12, hundred);
    REQUIRE(b.formula != syntax::no_index);
    const auto& product =
        book.tree.nodes[book.tree.sides[book.tree.formulas[b.formula].first_side].root];
    CHECK(product.kind == syntax::expr_kind::multiply);
    CHECK(book.tree.nodes[product.rhs].kind == syntax::expr_kind::divide);
    // '^' groups to the left: 2^3^2 is (2^3)^2.
    const auto c = lower_formula(book, wb, 0, 13, 19, hundred);
    const auto& power =
        book.tree.nodes[book.tree.sides[book.tree.formulas[c.formula].first_side].root];
    CHECK(power.kind == syntax::expr_kind::power);
    CHECK(book.tree.nodes[power.lhs].kind == syntax::expr_kind::power);
    const auto bad = lower_formula(book, wb, 0, 6, 10, hundred); // "=A1*"
    CHECK(bad.formula == syntax::no_index);
    CHECK(bad.syntax_error == std::string("expected a term after '*' or '/'"));
}

TEST_CASE("sheets: the corpus workbooks saved by LibreOffice read the same in both formats") {
    const workbook x = read_workbook(read_corpus("well-test.xlsx"), "well-test.xlsx");
    const workbook o = read_workbook(read_corpus("well-test.ods"), "well-test.ods");
    REQUIRE(x.sheets.size() == 3);
    REQUIRE(o.sheets.size() == 3);
    for (std::size_t s = 0; s < 3; ++s) {
        CHECK(x.sheets[s].name == o.sheets[s].name);
        for (const auto& c : x.sheets[s].cells)
            if (c.kind == cell_kind::formula) {
                const cell* other = o.sheets[s].find(c.at);
                REQUIRE(other != nullptr);
                CHECK(other->text == c.text);
            }
    }
    CHECK(x.names.size() == 2);
    CHECK(o.names.size() == 2);
}

TEST_CASE("sheets: hostile and damaged files are refused with a plain message") {
    // A compression bomb: 20 MiB of spaces packs into a few kilobytes.
    const std::string bomb = ods_with_content(std::string(20U << 20, ' '));
    CHECK(refusal(bomb, "b.ods").find("compression bomb") != std::string::npos);
    // Entities: any DOCTYPE is refused before parsing, so no expansion can happen.
    const std::string laughs =
        "<?xml version=\"1.0\"?><!DOCTYPE lolz [<!ENTITY lol \"lol\"><!ENTITY lol2 "
        "\"&lol;&lol;&lol;&lol;\">]><office:document-content>&lol2;</office:document-content>";
    CHECK(refusal(ods_with_content(laughs), "e.ods").find("DOCTYPE") != std::string::npos);
    // Depth: 100 000 nested elements.
    std::string deep;
    for (int i = 0; i < 100000; ++i)
        deep += "<a>";
    for (int i = 0; i < 100000; ++i)
        deep += "</a>";
    CHECK(refusal(ods_with_content(deep), "d.ods").find("nests") != std::string::npos);
    // Truncation: half of a workbook LibreOffice saved.
    const std::string whole = read_corpus("pump-sizing.xlsx");
    REQUIRE(whole.size() > 1000);
    CHECK(refusal(whole.substr(0, whole.size() / 2), "t.xlsx").find("zip") != std::string::npos);
    // A word-processing package named .xlsx.
    const std::string docx =
        make_zip({{"[Content_Types].xml",
                   "<Types><Override PartName=\"/word/document.xml\" ContentType=\"application/"
                   "vnd.openxmlformats-officedocument.wordprocessingml.document.main+xml\"/>"
                   "</Types>"},
                  {"word/document.xml", "<w:document/>"}});
    CHECK(refusal(docx, "w.xlsx").find("word-processing") != std::string::npos);
    // An encrypted workbook is a compound file, not a zip.
    CHECK(refusal(std::string("\xD0\xCF\x11\xE0\xA1\xB1\x1A\xE1", 8) + std::string(600, '\0'),
                  "p.xlsx")
              .find("encrypted") != std::string::npos);
    CHECK(refusal("just some text", "n.xlsx").find("not a zip") != std::string::npos);
    // Mislabelled: an OpenDocument spreadsheet named .xlsx.
    CHECK(refusal(read_corpus("pump-sizing.ods"), "m.xlsx").find("rename") != std::string::npos);
    // Too many cells for the limit.
    read_limits few;
    few.max_cells = 10;
    CHECK(refusal(whole, "c.xlsx", few).find("cells") != std::string::npos);
}

TEST_CASE("sheets: a bad workbook is exit status 2 and the good one beside it is still checked") {
    const std::string dir = std::string(PLUMB_SOURCE_DIR) + "/corpus/sheets/";
    const auto bad = std::filesystem::temp_directory_path() / "plumb-bad-workbook.xlsx";
    {
        std::ofstream out(bad, std::ios::binary);
        out << "not a workbook";
    }
    const check_report report = check_paths({bad, dir + "pump-sizing.xlsx"});
    std::filesystem::remove(bad);
    CHECK(report.input_failed);
    CHECK(report.workbooks_checked == 1);
    CHECK(report.cells_checked > 20);
    // Findings are placed by sheet and cell, in text and in JSON.
    const std::string text = render_text(report);
    CHECK(text.find("pump-sizing.xlsx:Pump!C14: error:") != std::string::npos);
    const std::string json = render_json(report);
    CHECK(json.find("\"sheet\": \"Pump\", \"cell\": \"C14\"") != std::string::npos);
    CHECK(json.find("\"inputs_without_units\": 1") != std::string::npos);
}

namespace {

// The corpus's well-test.xlsx copied to a folder of its own, with `sidecar` beside it.
check_report check_well_test_with(const std::string& sidecar, const std::string& folder) {
    const auto dir = std::filesystem::temp_directory_path() / folder;
    std::filesystem::create_directories(dir);
    {
        std::ofstream out(dir / "well-test.xlsx", std::ios::binary);
        out << read_corpus("well-test.xlsx");
        std::ofstream side(dir / "well-test.cells.plumb", std::ios::binary);
        side << sidecar;
    }
    check_report report = check_paths({dir / "well-test.xlsx"});
    return report;
}

const diagnostic* finding_at(const check_report& report, std::string_view place,
                             std::string_view rule) {
    for (const auto& d : report.diagnostics)
        if (d.rule == rule && d.where.file != nullptr)
            if (const cell_place* at = d.where.file->cell_at(d.where.range.begin);
                at != nullptr && cell_text(*at) == place)
                return &d;
    return nullptr;
}

} // namespace

TEST_CASE("sheets: a sidecar's cells lines give cells a unit that wins over the text beside") {
    // Without the sidecar's line, Inputs!C6 is in psi (beside it in D6), and Calc!C7, which
    // subtracts it from kPa, is a unit-scale error; so is Calc!C5, a lookup of it in a kPa
    // table (corpus/sheets/well-test.expect).
    const check_report plain = check_well_test_with("Rate : bbl/d\n", "plumb-sidecar-plain");
    CHECK(finding_at(plain, "Calc!C7", rules::unit_scale) != nullptr);
    CHECK(finding_at(plain, "Calc!C5", rules::unit_scale) != nullptr);
    // The sidecar says the gauge was re-read in kPa: the subtraction and the lookup now agree.
    const check_report cells = check_well_test_with(
        "Rate : bbl/d\ncells Inputs!C6 : kPa \"re-read in kPa\"\n", "plumb-sidecar-cell");
    INFO(render_text(cells));
    CHECK(finding_at(cells, "Calc!C7", rules::unit_scale) == nullptr);
    CHECK(finding_at(cells, "Calc!C5", rules::unit_scale) == nullptr);
    // Untouched cells keep their findings.
    CHECK(finding_at(cells, "Calc!C11", rules::unit_scale) != nullptr);
    CHECK_FALSE(cells.input_failed);
}

TEST_CASE("sheets: a whole column and a range from the sidecar, named in the notes") {
    // The viscosity table's column given in Pa·s (1000 mPa·s, SI Brochure 9th ed., Table 4
    // and prefixes): the lookup at Calc!C4, written as mPa·s, is now 1000 times off.
    const check_report column = check_well_test_with(
        "cells Tables!B : Pa*s\ncells Inputs!C5:C6 : kPa\n", "plumb-sidecar-column");
    INFO(render_text(column));
    const diagnostic* lookup = finding_at(column, "Calc!C4", rules::unit_scale);
    REQUIRE(lookup != nullptr);
    bool noted = false;
    for (const auto& n : lookup->notes)
        noted =
            noted || n.message.find("from the sidecar well-test.cells.plumb") != std::string::npos;
    CHECK(noted);
    // The range made C6 kPa as well: the drawdown's subtraction agrees.
    CHECK(finding_at(column, "Calc!C7", rules::unit_scale) == nullptr);
}

TEST_CASE("sheets: a sidecar line naming a sheet the workbook lacks is a clear finding") {
    const check_report report =
        check_well_test_with("cells Pumps!C4 : kPa\n", "plumb-sidecar-no-sheet");
    std::vector<const diagnostic*> problems;
    for (const auto& d : report.diagnostics)
        if (d.rule == rules::sidecar_problem)
            problems.push_back(&d);
    REQUIRE(problems.size() == 1);
    CHECK(problems.front()->message.find("no sheet named 'Pumps'") != std::string::npos);
    REQUIRE(!problems.front()->notes.empty());
    CHECK(problems.front()->notes.front().message.find("Inputs, Tables, Calc") !=
          std::string::npos);
}

TEST_CASE("sheets: a shared formula moves its relative references (ECMA-376 Part 1, 18.3.1.40)") {
    // Master in C2 (row 1, column 2), follower in C5: three rows down, same column.
    const cell_address c2{1, 2};
    CHECK(shift_formula("A2*B2", c2, {4, 2}) == "A5*B5");
    // '$' parts stay; a follower one column right moves only relative columns.
    CHECK(shift_formula("$A2*B$2+$C$3", c2, {1, 3}) == "$A2*C$2+$C$3");
    // Other sheets' cells move too; quoted names, strings, functions and names stay.
    CHECK(shift_formula("SUM('Pump data'!A2:A4)+IF(B2>0,\"B2\",Rate)*LOG10(B2)", c2, {2, 2}) ==
          "SUM('Pump data'!A3:A5)+IF(B3>0,\"B2\",Rate)*LOG10(B3)");
    // Numbers are not references.
    CHECK(shift_formula("B2*3.6+1E3", c2, {2, 2}) == "B3*3.6+1E3");
    // Whole columns and rows, and a reference moved off the sheet, are not guessed.
    CHECK_FALSE(shift_formula("SUM(A:A)", c2, {2, 2}).has_value());
    CHECK_FALSE(shift_formula("SUM(2:2)", c2, {2, 2}).has_value());
    CHECK_FALSE(shift_formula("A1", c2, {0, 2}).has_value());
}

TEST_CASE("sheets: shared formulas in an .xlsx are expanded to every cell of their area") {
    // A hand-built package (invented demo data): D2 is the master of D2:D4 (flow = area *
    // velocity); D3 and D4 follow it and read their own row.
    const std::string sheet =
        "<worksheet><sheetData>"
        "<row r=\"1\"><c r=\"B1\" t=\"inlineStr\"><is><t>Area [m2]</t></is></c>"
        "<c r=\"C1\" t=\"inlineStr\"><is><t>Velocity [m/s]</t></is></c>"
        "<c r=\"D1\" t=\"inlineStr\"><is><t>Flow [m3/s]</t></is></c></row>"
        "<row r=\"2\"><c r=\"B2\"><v>0.5</v></c><c r=\"C2\"><v>2</v></c>"
        "<c r=\"D2\"><f t=\"shared\" ref=\"D2:D4\" si=\"0\">B2*C2</f><v>1</v></c></row>"
        "<row r=\"3\"><c r=\"B3\"><v>0.25</v></c><c r=\"C3\"><v>2</v></c>"
        "<c r=\"D3\"><f t=\"shared\" si=\"0\"/><v>0.5</v></c></row>"
        "<row r=\"4\"><c r=\"B4\"><v>2000</v></c><c r=\"C4\"><v>2</v></c>"
        "<c r=\"D4\"><f t=\"shared\" si=\"0\"/><v>4000</v></c>"
        "<c r=\"E4\" t=\"inlineStr\"><is><t>m3/s</t></is></c></row>"
        "</sheetData></worksheet>";
    const std::string book = xlsx_of_one_sheet("Flow", sheet);
    const workbook read = read_workbook(book, "flow.xlsx");
    REQUIRE(read.sheets.size() == 1);
    const cell* d3 = read.sheets[0].find({2, 3});
    REQUIRE(d3 != nullptr);
    CHECK(d3->text == "=B3*C3");
    const cell* d4 = read.sheets[0].find({3, 3});
    REQUIRE(d4 != nullptr);
    CHECK(d4->text == "=B4*C4");
}

TEST_CASE("sheets: standard gravity written as a number in a cell formula (9.81)") {
    // p = ρ g h (g_n = 9.80665 m/s², 3rd CGPM 1901); an invented tank sheet. B4 converts to kPa
    // and is right; B5 lacks g; B6 has g but gives Pa in a kPa cell.
    const std::string sheet =
        "<worksheet><sheetData>" + value_and_unit_row(2, "1000", "kg/m3") +
        value_and_unit_row(3, "12", "m") + value_and_unit_row(4, "=B2*9.81*B3/1000", "kPa") +
        value_and_unit_row(5, "=B2*B3", "Pa") + value_and_unit_row(6, "=B2*9.81*B3", "kPa") +
        "</sheetData></worksheet>";
    CHECK(cell_findings_of_one_sheet("Tank", sheet) ==
          std::vector<std::string>{"Tank!B4 gravity-number", "Tank!B5 result-unit",
                                   "Tank!B6 gravity-number", "Tank!B6 unit-scale"});
}

TEST_CASE("sheets: the pump trade's water numbers in cell formulas (3960, 2.31, 1.08)") {
    // Water horsepower Q·H/3960 (hp, gpm, ft), head 2.31 ft per psi, and the HVAC sensible load
    // 1.08·cfm·ΔT: the numbers carry water's specific weight and air's heat capacity (see
    // check/gravity_number.cpp; common practice). B5 has the factor the wrong way round, and
    // says so; B7 uses the air number for a water flow: both stay errors.
    const std::string sheet =
        "<worksheet><sheetData>" + value_and_unit_row(2, "450", "gpm") +
        value_and_unit_row(3, "120", "ft") + value_and_unit_row(4, "=B2*B3/3960", "hp") +
        value_and_unit_row(5, "=B2*B3*3960", "hp") + value_and_unit_row(6, "=2.31*B8", "ft") +
        value_and_unit_row(7, "=1.08*B2*B9", "Btu/h") + value_and_unit_row(8, "35", "psi") +
        value_and_unit_row(9, "20", "Δ°F") + value_and_unit_row(10, "=1.08*B11*B9", "Btu/h") +
        value_and_unit_row(11, "2000", "cfm") + "</sheetData></worksheet>";
    CHECK(cell_findings_of_one_sheet("Pumps", sheet) ==
          std::vector<std::string>{"Pumps!B10 trade-constant", "Pumps!B4 gravity-number",
                                   "Pumps!B5 unit-scale", "Pumps!B6 gravity-number",
                                   "Pumps!B7 result-unit"});
}

namespace {

// A one-sheet .ods built in memory: each row's entries are a number ("250"), a formula in
// OpenFormula ("of:=[.B2]/[.B1]") or a text ("mm"); "" leaves the cell empty.
std::string ods_of_rows(const std::vector<std::vector<std::string>>& rows) {
    std::string xml = "<?xml version=\"1.0\"?><office:document-content><office:body>"
                      "<office:spreadsheet><table:table table:name=\"Calc\">";
    for (const auto& row : rows) {
        xml += "<table:table-row>";
        for (const auto& entry : row) {
            if (entry.empty())
                xml += "<table:table-cell/>";
            else if (entry.rfind("of:=", 0) == 0)
                xml += "<table:table-cell table:formula=\"" + entry +
                       "\" office:value-type=\"float\" office:value=\"0\"/>";
            else if (entry.find_first_not_of("0123456789.") == std::string::npos)
                xml += "<table:table-cell office:value-type=\"float\" office:value=\"" + entry +
                       "\"/>";
            else
                xml += "<table:table-cell office:value-type=\"string\"><text:p>" + entry +
                       "</text:p></table:table-cell>";
        }
        xml += "</table:table-row>";
    }
    xml += "</table:table></office:spreadsheet></office:body></office:document-content>";
    return ods_with_content(xml);
}

check_report check_ods_rows(const std::vector<std::vector<std::string>>& rows,
                            const std::string& folder) {
    const auto dir = std::filesystem::temp_directory_path() / folder;
    std::filesystem::create_directories(dir);
    {
        std::ofstream out(dir / "calc.ods", std::ios::binary);
        out << ods_of_rows(rows);
    }
    return check_paths({dir / "calc.ods"});
}

} // namespace

TEST_CASE("sheets: an input without a unit is told the dimension and scale its uses require") {
    // Relative roughness ε/D is dimensionless (Moody chart, common practice), so with D in mm
    // ε must be a length in mm; distance = speed × time (a time in s beside m/s); x + D needs x
    // as a length, √x = length needs x as an area: those two uses disagree.
    const check_report r = check_ods_rows(
        {
            {"D", "250", "mm"},
            {"eps", "0.05", ""},
            {"eps/D", "of:=[.B2]/[.B1]", "-"},
            {"t", "12", ""},
            {"distance", "of:=[.B4]*[.B6]", "m"},
            {"speed", "2", "m/s"},
            {"x", "3", ""},
            {"x+D", "of:=[.B7]+[.B1]", "mm"},
            {"root x", "of:=SQRT([.B7])", "m"},
        },
        "plumb-input-requirement");
    INFO(render_text(r));
    CHECK(r.inputs_without_units == 3);
    const diagnostic* eps = finding_at(r, "Calc!B2", rules::no_unit);
    REQUIRE(eps != nullptr);
    CHECK(eps->message.find("used as a length [L] in Calc!B3") != std::string::npos);
    CHECK(std::any_of(eps->notes.begin(), eps->notes.end(), [](const note& n) {
        return n.message.find("must be in mm, as B1 is") != std::string::npos;
    }));
    const diagnostic* t = finding_at(r, "Calc!B4", rules::no_unit);
    REQUIRE(t != nullptr);
    CHECK(t->message.find("used as a time [T] in Calc!B5") != std::string::npos);
    CHECK(std::any_of(t->notes.begin(), t->notes.end(), [](const note& n) {
        return n.message.find("coherent SI units") != std::string::npos;
    }));
    const diagnostic* x = finding_at(r, "Calc!B7", rules::no_unit);
    REQUIRE(x != nullptr);
    CHECK(x->message.find("its uses disagree") != std::string::npos);
    CHECK(x->message.find("a length [L] in Calc!B8") != std::string::npos);
    CHECK(x->message.find("an area [L^2] in Calc!B9") != std::string::npos);
}

TEST_CASE("sheets: the sidecar beside the workbook comes before --dict; a conflict is reported") {
    const auto dir = std::filesystem::temp_directory_path() / "plumb-sidecar-and-dict";
    std::filesystem::create_directories(dir);
    {
        std::ofstream out(dir / "well-test.xlsx", std::ios::binary);
        out << read_corpus("well-test.xlsx");
        std::ofstream side(dir / "well-test.cells.plumb", std::ios::binary);
        side << "Rate : bbl/d\ncells Inputs!C6 : kPa \"re-read in kPa\"\n";
        std::ofstream dict(dir / "site.plumb", std::ios::binary);
        dict << "cells Inputs!C6 : psi \"the site's gauges\"\ncells Inputs!C7 : m\n";
        std::ofstream same(dir / "same.plumb", std::ios::binary);
        same << "cells Inputs!C6 : kPa\n";
    }
    check_options options;
    options.dictionaries = {dir / "site.plumb"};
    const check_report both = check_paths({dir / "well-test.xlsx"}, options);
    INFO(render_text(both));
    // The sidecar's kPa is used (Calc!C7 subtracts C6 from a kPa value without a finding) and
    // the dictionary's psi for the same cell is reported, naming both files.
    CHECK(finding_at(both, "Calc!C7", rules::unit_scale) == nullptr);
    std::vector<const diagnostic*> conflicts;
    for (const auto& d : both.diagnostics)
        if (d.rule == rules::sidecar_problem)
            conflicts.push_back(&d);
    REQUIRE(conflicts.size() == 1);
    CHECK(conflicts[0]->message.find("well-test.cells.plumb") != std::string::npos);
    CHECK(conflicts[0]->message.find("site.plumb") != std::string::npos);
    CHECK(conflicts[0]->message.find("Inputs!C6") != std::string::npos);
    CHECK(conflicts[0]->where.file->path().find("well-test.cells.plumb") != std::string::npos);
    // A dictionary that agrees with the sidecar is no conflict.
    options.dictionaries = {dir / "same.plumb"};
    const check_report agreeing = check_paths({dir / "well-test.xlsx"}, options);
    CHECK(std::none_of(agreeing.diagnostics.begin(), agreeing.diagnostics.end(),
                       [](const diagnostic& d) { return d.rule == rules::sidecar_problem; }));
    // Without a sidecar, the --dict file's line gives the unit: psi, so Calc!C7 is off again.
    std::filesystem::remove(dir / "well-test.cells.plumb");
    options.dictionaries = {dir / "site.plumb"};
    const check_report dict_only = check_paths({dir / "well-test.xlsx"}, options);
    CHECK(finding_at(dict_only, "Calc!C7", rules::unit_scale) != nullptr);
}

TEST_CASE("sheets: a factor written into a formula agrees by the notation's exact rule") {
    // 1 kg = 1/0.45359237 lb = 2.2046226 lb (NIST SP 811 (2008), B.8). 2.205 is that factor
    // rounded (within 2.205 ± 0.0005), and 2.204 cut, as tables print some; 2.206 is 0.0014
    // above it, more than half a unit in its last digit, so it is not the factor (a relative
    // 1e-3 would have taken it).
    const check_report r = check_ods_rows(
        {
            {"mass", "12", "kg"},
            {"rounded", "of:=[.B1]*2.205", "lb"},
            {"cut short", "of:=[.B1]*2.206", "lb"},
            {"inverted", "of:=[.B1]/2.205", "lb"},
            {"exact", "of:=[.B1]/0.45359237", "lb"},
        },
        "plumb-sheet-factor-rule");
    INFO(render_text(r));
    CHECK(finding_at(r, "Calc!B2", rules::unit_scale) == nullptr);
    const diagnostic* cut = finding_at(r, "Calc!B3", rules::unit_scale);
    REQUIRE(cut != nullptr);
    CHECK(cut->message.find("the factor 2.206 is near the conversion to lb but is not it") !=
          std::string::npos);
    CHECK(cut->message.find("reads 2.205") != std::string::npos);
    const diagnostic* inverted = finding_at(r, "Calc!B4", rules::unit_scale);
    REQUIRE(inverted != nullptr);
    CHECK(inverted->message.find("wrong way round") != std::string::npos);
    CHECK(finding_at(r, "Calc!B5", rules::unit_scale) == nullptr);
    // Factors are printed as engineers read them, never in e-notation.
    for (const auto& d : r.diagnostics)
        CHECK(d.message.find("e+") == std::string::npos);
}

TEST_CASE("sheets: a column headed as a difference holds differences, which take no zero") {
    // A chilled-water range in Δ°F to K: divide by 1.8 alone (NIST SP 811 (2008), B.8; a
    // difference has no zero to move). "ΔT [°F]" heads the column; (F − 32)/1.8 converts a
    // reading, a slip on a difference (12.5 Δ°F would come out at −10.8 K).
    const auto text = [](const std::string& at, const std::string& t) {
        return "<c r=\"" + at + "\" t=\"inlineStr\"><is><t>" + t + "</t></is></c>";
    };
    const std::string sheet =
        "<worksheet><sheetData><row r=\"1\">" + text("A1", "\u0394T [\u00B0F]") +
        text("B1", "\u0394T [K]") + text("C1", "Return [\u00B0F]") + text("D1", "Return [K]") +
        "</row><row r=\"2\"><c r=\"A2\"><v>12.5</v></c><c r=\"B2\"><f>A2/1.8</f><v>0</v></c>"
        "<c r=\"C2\"><v>56</v></c><c r=\"D2\"><f>(C2-32)/1.8+273.15</f><v>0</v></c></row>"
        "<row r=\"3\"><c r=\"A3\"><v>12.5</v></c><c r=\"B3\"><f>(A3-32)/1.8</f><v>0</v></c>"
        "</row></sheetData></worksheet>";
    CHECK(cell_findings_of_one_sheet("Chillers", sheet) ==
          std::vector<std::string>{"Chillers!B3 sum-mismatch"});
}

TEST_CASE("sheets: a lookup not checked does not report its table as a mixed range") {
    // A correction table keyed by °F with factors beside it (the layout of the petroleum
    // measurement tables' volume correction factors, from memory): a column picked by IF
    // leaves the cell not checked, and the table is no range of one unit.
    const auto text = [](const std::string& at, const std::string& t) {
        return "<c r=\"" + at + "\" t=\"inlineStr\"><is><t>" + t + "</t></is></c>";
    };
    const std::string sheet =
        "<worksheet><sheetData><row r=\"1\">" + text("A1", "Temperature [\u00B0F]") +
        text("B1", "VCF light [-]") + text("C1", "VCF heavy [-]") + text("E1", "API [-]") +
        text("F1", "t [\u00B0F]") + text("G1", "VCF [-]") +
        "</row><row r=\"2\"><c r=\"A2\"><v>60</v></c><c r=\"B2\"><v>1</v></c>"
        "<c r=\"C2\"><v>1</v></c><c r=\"E2\"><v>30</v></c><c r=\"F2\"><v>70</v></c>"
        "<c r=\"G2\"><f>VLOOKUP(F2,A2:C3,IF(E2&lt;34,2,3))</f><v>0</v></c></row>"
        "<row r=\"3\"><c r=\"A3\"><v>80</v></c><c r=\"B3\"><v>0.99</v></c>"
        "<c r=\"C3\"><v>0.992</v></c></row></sheetData></worksheet>";
    CHECK(cell_findings_of_one_sheet("Ticket", sheet) ==
          std::vector<std::string>{"Ticket!G2 not-checked"});
}

TEST_CASE("sheets: a sidecar's measure comes before the trade's spelling of the same name") {
    // A boiler horsepower is 33,475 Btu/h (ABMA, common practice); "BHP" alone the trades read
    // as brake horsepower, 2544.43 Btu/h (NIST SP 811 (2008), B.8). The sidecar decides.
    const std::string sheet =
        "<worksheet><sheetData>" + plumb::test::value_and_unit_row(2, "6700000", "Btu/h") +
        plumb::test::value_and_unit_row(3, "=B2/33475", "BHP") +
        plumb::test::value_and_unit_row(4, "=B2/2544", "BHP") + "</sheetData></worksheet>";
    const auto r = plumb::test::check_one_sheet(
        "Plant", sheet, "measure BHP = 33475 Btu/h \"boiler horsepower\"\n");
    CHECK(plumb::test::cell_findings(r) == std::vector<std::string>{"Plant!B4 unit-scale"});
}

TEST_CASE("sheets: CEILING's significance is in its number's unit, as written") {
    // A wet well's depth rounded up to 50 mm: =CEILING(B2*1000,50) with B2 in m (ECMA-376
    // Part 1, 18.17.7: CEILING(number, significance)); the 1000 converts the number, and the
    // significance is in mm too. Without the 1000 the cell is 1000 times too small.
    const std::string sheet =
        "<worksheet><sheetData>" + plumb::test::value_and_unit_row(2, "1.234", "m") +
        plumb::test::value_and_unit_row(3, "=CEILING(B2*1000,50)", "mm") +
        plumb::test::value_and_unit_row(4, "=CEILING(B2,0.05)", "m") +
        plumb::test::value_and_unit_row(5, "=CEILING(B2,50)", "mm") + "</sheetData></worksheet>";
    CHECK(cell_findings_of_one_sheet("Well", sheet) ==
          std::vector<std::string>{"Well!B5 unit-scale"});
}

TEST_CASE("sheets: a column's pressure typed with its number, plus the atmosphere") {
    // p = 9.81·h + 101.325 in kPa from a depth in m (γ_w = 9.81 kN/m³; the standard atmosphere,
    // 101.325 kPa, 3rd CGPM): absolute. Written as gauge it is the atmosphere added twice.
    const std::string sheet =
        "<worksheet><sheetData>" + plumb::test::value_and_unit_row(2, "12", "m") +
        plumb::test::value_and_unit_row(3, "=9.81*B2+101.325", "kPa") +
        plumb::test::value_and_unit_row(4, "=9.81*B2+101.325", "kPa(g)") +
        plumb::test::value_and_unit_row(5, "=9.81*B2", "kPa(g)") + "</sheetData></worksheet>";
    const auto found = plumb::test::cell_findings(plumb::test::check_one_sheet("Tank", sheet));
    CHECK(std::count_if(found.begin(), found.end(), [](const std::string& f) {
              return f.rfind("Tank!B3 ", 0) == 0 && f != "Tank!B3 gravity-number" &&
                     f != "Tank!B3 trade-constant";
          }) == 0);
    CHECK(std::find(found.begin(), found.end(), "Tank!B4 offset-scale") != found.end());
    CHECK(std::count_if(found.begin(), found.end(), [](const std::string& f) {
              return f.rfind("Tank!B5 ", 0) == 0 && f != "Tank!B5 gravity-number";
          }) == 0);
}

// The inch of water as gas meter sheets type it beside a differential (common practice):
// each reads as the conventional inch, 249.08891 Pa (NIST SP 811 (2008), B.8).
TEST_CASE("sheets: inches of water spelled the meter trade's ways read as inH2O") {
    for (const char* text : {"in H2O", "in. H2O", "in.H2O", "in H\u2082O", "inches H2O", "in WC",
                             "in. WC", "\" H2O", "\" w.c."}) {
        CAPTURE(text);
        const auto unit = read_unit_text(text);
        REQUIRE(unit.has_value());
        CHECK(unit->scale == doctest::Approx(249.08891).epsilon(1e-9));
    }
}

// A mean of readings weighted by tonnage, =SUMPRODUCT(w,T)/SUM(w): the weights sum to one, so
// the °C scale's zero cancels as in (q_h·T_h + q_c·T_c)/(q_h + q_c) (common practice). The
// mean is a reading on the °C scale; set under K it is the zero's slip, and SUMPRODUCT alone
// multiplies readings.
TEST_CASE("sheets: a weighted mean of readings by SUMPRODUCT over SUM") {
    const std::string sheet = "<worksheet><sheetData>" + value_and_unit_row(2, "40", "t") +
                              value_and_unit_row(3, "60", "t") + value_and_unit_row(4, "18", "°C") +
                              value_and_unit_row(5, "24", "°C") +
                              value_and_unit_row(6, "=SUMPRODUCT(B2:B3,B4:B5)/SUM(B2:B3)", "°C") +
                              value_and_unit_row(7, "=SUMPRODUCT(B4:B5,B2:B3)/SUM(B2:B3)", "K") +
                              value_and_unit_row(8, "=SUMPRODUCT(B2:B3,B4:B5)/SUM(B4:B5)", "°C") +
                              "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Crush", sheet);
    CHECK(std::none_of(found.begin(), found.end(),
                       [](const std::string& f) { return f.rfind("Crush!B6 ", 0) == 0; }));
    CHECK(std::find(found.begin(), found.end(), "Crush!B7 offset-scale") != found.end());
    CHECK(std::find(found.begin(), found.end(), "Crush!B8 offset-scale") != found.end());
}

// A quarry's short tons an hour (2000 lb = 907.18474 kg, NIST SP 811 (2008), B.8), a specific
// gravity's column and a brewer's degrees Plato (grams of extract per 100 g, a share by mass;
// common practice), as sheets type them beside their cells.
TEST_CASE("sheets: stph, SG and degrees Plato beside a cell") {
    const auto stph = read_unit_text("stph");
    REQUIRE(stph.has_value());
    CHECK(stph->scale == doctest::Approx(907.18474 / 3600.0).epsilon(1e-12));
    for (const char* text : {"SG", "S.G."}) {
        CAPTURE(text);
        const auto unit = read_unit_text(text);
        REQUIRE(unit.has_value());
        CHECK(unit->scale == 1.0);
    }
    const auto plato = read_unit_text("\u00B0P");
    REQUIRE(plato.has_value());
    CHECK(plato->scale == doctest::Approx(0.01));
}

namespace {

// A row with its label in A, its value or formula in B and its unit in C.
std::string labelled_row(int r, const std::string& label, const std::string& value,
                         const std::string& unit) {
    const std::string n = std::to_string(r);
    return "<row r=\"" + n + "\"><c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label +
           "</t></is></c>" +
           value_and_unit_row(r, value, unit).substr(("<row r=\"" + n + "\">").size());
}

} // namespace

// A transfer pump's discharge gauge pressure: the line's friction loss plus the column up to a
// vented tank, ρ·g·h with g typed as 9.81 (common practice). Both are differences a gauge reads.
// A mean of two °C readings taken to °F in one cell, (t_1 + t_2)/2·1.8 + 32 (NIST SP 811 (2008),
// B.8), and a sprinkler's pressure from its flow and K-factor, p = (q/K)² (EN 12845; NFPA 13,
// from memory), a drop across the orifice a gauge reads, are correct cells too.
TEST_CASE("sheets: a friction loss and a column into a gauge cell, a mean into °F, (q/K)^2") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Friction loss", "35", "kPa") +
        labelled_row(3, "Density", "870", "kg/m³") + labelled_row(4, "Height", "12", "m") +
        labelled_row(5, "Discharge pressure", "=B2+B3*9.81*B4/1000", "kPa(g)") +
        labelled_row(6, "Inlet temperature", "40", "°C") +
        labelled_row(7, "Outlet temperature", "50", "°C") +
        labelled_row(8, "Mean temperature", "=(B6+B7)/2*1.8+32", "°F") +
        labelled_row(9, "Mean temperature, slip", "=(B6+B7)/2+32", "°F") +
        labelled_row(10, "Flow", "80", "L/min") +
        labelled_row(11, "K-factor", "80", "L/min/bar^0.5") +
        labelled_row(12, "Pressure at head", "=(B10/B11)^2", "bar(g)") + "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Tank", sheet);
    for (const char* clean : {"Tank!B5 ", "Tank!B8 ", "Tank!B12 "}) {
        CAPTURE(clean);
        CHECK(std::none_of(found.begin(), found.end(), [&](const std::string& f) {
            return f.rfind(clean, 0) == 0 && f.find("gravity-number") == std::string::npos;
        }));
    }
    CHECK(std::find(found.begin(), found.end(), "Tank!B9 offset-scale") != found.end());
}

// Hazen-Williams as NFPA 13 prints it, p = 4.52·Q^1.85/(C^1.85·d^4.87) in psi/ft from gpm and
// inches (from memory), fed from cells in L/min and mm through 3.785 L/gal and 25.4 mm/in (NIST
// SP 811 (2008), B.8): the numbers convert the cells inside the powers and are no reference
// values in the cells' own units. The bore left in mm is still reported.
TEST_CASE("sheets: the US Hazen-Williams form fed from SI cells through conversions") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Flow", "950", "L/min") +
        labelled_row(3, "C factor", "120", "-") + labelled_row(4, "Bore", "53.1", "mm") +
        labelled_row(5, "Friction", "=4.52*(B2/3.785)^1.85/(B3^1.85*(B4/25.4)^4.87)", "psi/ft") +
        labelled_row(6, "Friction, bore in mm", "=4.52*(B2/3.785)^1.85/(B3^1.85*B4^4.87)",
                     "psi/ft") +
        "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Lines", sheet);
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Lines!B5 ", 0) == 0 && f != "Lines!B5 trade-constant";
    }));
    CHECK(std::any_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Lines!B6 ", 0) == 0 && f != "Lines!B6 trade-constant";
    }));
}

// The treatment trades name what a mass is of beside its unit (Metcalf & Eddy, from memory):
// kg O2/d, lb BOD/d, kg N/d read as kg/d and lb/d; kN stays a force.
TEST_CASE("sheets: a mass named for what it is of") {
    for (const auto& spelled :
         std::initializer_list<std::pair<const char*, double>>{{"kg O2/d", 1.0 / 86400.0},
                                                               {"kg O2/h", 1.0 / 3600.0},
                                                               {"lb BOD/d", 0.45359237 / 86400.0},
                                                               {"kg N/d", 1.0 / 86400.0}}) {
        const char* text = spelled.first;
        CAPTURE(text);
        const auto unit = read_unit_text(text);
        REQUIRE(unit.has_value());
        CHECK(unit->scale == doctest::Approx(spelled.second).epsilon(1e-9));
    }
    const auto force = read_unit_text("kN");
    REQUIRE(force.has_value());
    CHECK(force->scale == 1000.0);
}

// A gauge reading in bar(g) taken to psi by 14.5 (14.5038 psi per bar, NIST SP 811 (2008), B.8)
// with the atmosphere, 14.7 psi, added: absolute, set under psig. The finding is the zero the
// 14.7 moves, as the notation says it, not a factor of 14.5 the formula already holds.
TEST_CASE("sheets: a converted gauge reading plus the atmosphere into a gauge cell") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Supply pressure", "3", "bar(g)") +
        labelled_row(3, "Supply pressure, US gauge", "=B2*14.5", "psig") +
        labelled_row(4, "Supply pressure, US, slip", "=B2*14.5+14.7", "psig") +
        labelled_row(5, "Supply pressure, US absolute", "=B2*14.5+14.7", "psia") +
        "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Skid", sheet);
    CHECK(std::find(found.begin(), found.end(), "Skid!B4 offset-scale") != found.end());
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f == "Skid!B4 unit-scale" || (f.rfind("Skid!B3 ", 0) == 0) ||
               (f.rfind("Skid!B5 ", 0) == 0 && f != "Skid!B5 trade-constant");
    }));
}

// "tons" over a chiller's rows is the ton of refrigeration, 12 000 Btu/h = 3.517 kW (NIST SP
// 811 (2008), B.8: 3.516853 kW); over a haul road's it is the short ton, 2000 lb = 907.18 kg.
// The plural is read as what the cell computes: a power, or a mass. A stray 1000 in a row of
// tons of refrigeration is then named, and a result that is neither stays unread.
TEST_CASE("sheets: 'tons' read as refrigeration or as mass by what the cell computes") {
    const std::string sheet = "<worksheet><sheetData>" + labelled_row(2, "Row load", "120", "kW") +
                              labelled_row(3, "Row load", "=B2/3.517", "tons") +
                              labelled_row(4, "Row load, slip", "=B2*1000/3.517", "tons") +
                              labelled_row(5, "Truck payload", "18000", "kg") +
                              labelled_row(6, "Truck payload", "=B5/907.2", "tons") +
                              labelled_row(7, "Truck payload, slip", "=B5/1000/907.2", "tons") +
                              labelled_row(8, "Haul distance", "=B2/B2*3", "tons") +
                              "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Plant", sheet);
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Plant!B3 ", 0) == 0 || f.rfind("Plant!B6 ", 0) == 0;
    }));
    CHECK(std::find(found.begin(), found.end(), "Plant!B4 unit-scale") != found.end());
    CHECK(std::find(found.begin(), found.end(), "Plant!B7 unit-scale") != found.end());
}

// A cooling tower's ton, 15 000 Btu/h (CTI, from memory): =C15/15000 under "tons" reads so,
// where a refrigeration ton would make the cell 1.25 times off.
TEST_CASE("sheets: 'tons' of a cooling tower") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Heat rejected", "4.2e6", "Btu/h") +
        labelled_row(3, "Heat rejected, cooling tower tons", "=B2/15000", "tons") +
        labelled_row(4, "Heat rejected, cooling tower tons, slip", "=B2/12000", "tons") +
        "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Tower", sheet);
    CHECK(std::none_of(found.begin(), found.end(),
                       [](const std::string& f) { return f.rfind("Tower!B3 ", 0) == 0; }));
    CHECK(std::any_of(found.begin(), found.end(),
                      [](const std::string& f) { return f.rfind("Tower!B4 ", 0) == 0; }));
}

// The US water trade's million gallons (MG, 3785.411784 m³: 10⁶ × 3.785411784 L, NIST SP 811
// (2008), B.8) in an energy per volume, and a boiler's horsepower written BHP beside a row that
// names the boiler (33 475 Btu/h, ABMA; common practice), not a shaft's brake horsepower.
TEST_CASE("sheets: kWh/MG and a boiler's BHP") {
    const auto energy = read_unit_text("kWh/MG");
    REQUIRE(energy.has_value());
    CHECK(energy->scale == doctest::Approx(3.6e6 / 3785.411784).epsilon(1e-9));
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Steam output", "4.0e6", "Btu/h") +
        labelled_row(3, "Boiler output, boiler horsepower", "=B2/33475", "BHP") +
        labelled_row(4, "Boiler output, slip", "=B2/2545", "BHP") +
        labelled_row(5, "Fan motor", "15", "kW") +
        labelled_row(6, "Fan motor, brake horsepower", "=B5/0.7457", "BHP") +
        "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Boiler", sheet);
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Boiler!B3 ", 0) == 0 || f.rfind("Boiler!B6 ", 0) == 0;
    }));
    CHECK(std::any_of(found.begin(), found.end(),
                      [](const std::string& f) { return f.rfind("Boiler!B4 ", 0) == 0; }));
}

// A vacuum in inHg counts down from the atmosphere (3.386 kPa per inHg, NIST SP 811 (2008),
// B.8): beside a row that types the site's barometer, the sea level's 101.325 less it is the
// slip, named as the atmosphere the vacuum counts from. And a moment in lb·ft, as US drawings
// write the pound-force, reads as lbf·ft like lb-ft does.
TEST_CASE("sheets: a vacuum row counts down from the site's barometer; lb·ft is a moment") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Site barometer", "98.2", "kPa") +
        labelled_row(3, "Operating vacuum at the receiver", "19", "inHg") +
        labelled_row(4, "Absolute pressure at the receiver", "=101.325-3.386*B3", "kPa") +
        labelled_row(5, "Line load", "30.4", "plf") + labelled_row(6, "Span", "14", "ft") +
        labelled_row(7, "Moment", "=B5*B6^2/8", "lb\u00B7ft") + "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Plant", sheet);
    CHECK(std::find(found.begin(), found.end(), "Plant!B4 offset-scale") != found.end());
    CHECK(std::none_of(found.begin(), found.end(),
                       [](const std::string& f) { return f.rfind("Plant!B7 ", 0) == 0; }));
}

// A barrel is 42 US gallons exactly and an hour 60 minutes (NIST SP 811 (2008), B.8): a
// transfer rate in bbl/h times 42/60 is in gpm. The 60 converts the clock the cells' units
// count in (h and min), which a ratio of two small whole numbers, 42/60 = 0.7, must not hide.
TEST_CASE("sheets: bbl/h times 42/60 is gpm, the clock read from the cells' units") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Transfer rate", "4200", "bbl/h") +
        labelled_row(3, "Transfer rate, US", "=B2*42/60", "gpm") +
        labelled_row(4, "Transfer rate, US, again", "=42*B2/60", "gal/min") +
        labelled_row(5, "Transfer rate, slip", "=B2*42/24", "gpm") + "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Tank", sheet);
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Tank!B3 ", 0) == 0 || f.rfind("Tank!B4 ", 0) == 0;
    }));
    CHECK(std::any_of(found.begin(), found.end(),
                      [](const std::string& f) { return f.rfind("Tank!B5 ", 0) == 0; }));
}

// A °C cell plus 273.15 written into a °F column is in kelvins (NIST SP 811 (2008), B.9): the
// cell is told to convert the scale, 1.8·t + 32, not that its value is 1.8 times too small.
TEST_CASE("sheets: a °C cell made absolute in a °F column is told the conversion") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Glycol supply", "-4", "\u00B0C") +
        labelled_row(3, "Glycol supply, US", "=B2+273.15", "\u00B0F") + "</sheetData></worksheet>";
    const auto report = plumb::test::check_one_sheet("Glycol", sheet);
    const auto it =
        std::find_if(report.diagnostics.begin(), report.diagnostics.end(),
                     [](const plumb::diagnostic& d) { return d.level != plumb::severity::note; });
    REQUIRE(it != report.diagnostics.end());
    CHECK(it->rule == plumb::rules::offset_scale);
    CHECK(plumb::test::says(*it, "write B2*1.8 + 32"));
}

// A reading less a reference number is a difference from it (degree-days over a 15 °C base,
// a tank's temperature above the 60 °F of a volume correction; common practice): written into
// a cell whose unit says Δ°C or Δ°F it is clean, as a symbol declared in Δ°C takes it. Into a
// plain K cell it is still the reading's zero that is wrong.
TEST_CASE("sheets: a reading less a number into a Δ°C or Δ°F cell is a difference") {
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Tank temperature", "24", "\u00B0C") +
        labelled_row(3, "Over the base", "=B2-15", "\u0394\u00B0C") +
        labelled_row(4, "Tank temperature, US", "75", "\u00B0F") +
        labelled_row(5, "Above the standard", "=B4-60", "\u0394\u00B0F") +
        labelled_row(6, "Tank temperature, absolute", "=B2-15", "K") + "</sheetData></worksheet>";
    const auto found = cell_findings_of_one_sheet("Tank", sheet);
    CHECK(std::none_of(found.begin(), found.end(), [](const std::string& f) {
        return f.rfind("Tank!B3 ", 0) == 0 || f.rfind("Tank!B5 ", 0) == 0;
    }));
    CHECK(std::find(found.begin(), found.end(), "Tank!B6 offset-scale") != found.end());
}
