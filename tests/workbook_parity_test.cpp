// A formula gets the same verdict in a workbook cell as in a .plumb file: the cell and the unit
// written for it are checked as the notation checks an equation's two sides. Each case puts
// the right forms beside the wrong ones that must stay errors.
#include "plumb/check.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"
#include "workbook_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <initializer_list>
#include <string>
#include <tuple>
#include <utility>
#include <vector>

using namespace plumb;
using plumb::test::cell_findings;
using plumb::test::check_after;
using plumb::test::check_one_sheet;
using plumb::test::count_of;
using plumb::test::each_fails_with;
using plumb::test::problems_in;
using plumb::test::says;
using plumb::test::value_and_unit_row;

namespace {

// A sheet of (value or formula, unit text) rows from row 2 on, value in B and unit in C.
std::string sheet_of(std::initializer_list<std::pair<std::string, std::string>> rows) {
    std::string xml = "<worksheet><sheetData>";
    int r = 2;
    for (const auto& [value, unit] : rows)
        xml += value_and_unit_row(r++, value, unit);
    return xml + "</sheetData></worksheet>";
}

// The first finding at `cell` under `rule`, or null.
const diagnostic* finding(const check_report& report, std::string_view cell,
                          std::string_view rule) {
    for (const auto& d : report.diagnostics)
        if (const cell_place* c =
                d.where.file != nullptr ? d.where.file->cell_at(d.where.range.begin) : nullptr)
            if (cell_text(*c) == cell && d.rule == rule)
                return &d;
    return nullptr;
}

// Whether an error is reported at `cell`, under whichever rule.
bool error_at(const check_report& report, std::string_view cell) {
    return std::any_of(report.diagnostics.begin(), report.diagnostics.end(), [&](const auto& d) {
        const cell_place* c =
            d.where.file != nullptr ? d.where.file->cell_at(d.where.range.begin) : nullptr;
        return c != nullptr && cell_text(*c) == cell && d.level == severity::error;
    });
}

} // namespace

TEST_CASE("workbook parity: a conversion factor the units do not need is reported") {
    // ML/d × mg/L is exactly kg/d (10⁶ L × 10⁻⁶ kg/L); m³/h × kg/m³ is kg/h; a value already in
    // m needs no *1000 (SI Brochure 9th ed., Table 8; common practice). A copied formula that
    // converts twice passed without a word in a workbook, though the notation reported it.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"17.28", "m"},               // B2
                                 {"=B2*1000", "m"},            // B3: not needed
                                 {"=B2*1000", "mm"},           // B4: right
                                 {"5", "ML/d"},                // B5
                                 {"2", "mg/L"},                // B6
                                 {"=B5*B6", "kg/d"},           // B7: right
                                 {"=B5*B6*1000", "kg/d"},      // B8: not needed
                                 {"=B5/24*1000", "m3/h"},      // B9: right
                                 {"=B5/24*1000*1000", "m3/h"}, // B10: one 1000 too many
                                 {"2400", "m3/h"},             // B11
                                 {"1.2", "kg/m3"},             // B12
                                 {"=B11*B12*3600", "kg/h"},    // B13: not needed
                                 {"=B11*B12/3600", "kg/s"},    // B14: right
                             }));
    CHECK(cell_findings(r) == std::vector<std::string>{"S!B10 unit-scale", "S!B13 unit-scale",
                                                       "S!B3 unit-scale", "S!B8 unit-scale"});
    const diagnostic* extra = finding(r, "S!B3", rules::unit_scale);
    REQUIRE(extra != nullptr);
    CHECK(extra->level == severity::error);
    CHECK(says(*extra, "the factor 1000 is not needed"));
    CHECK(says(*extra, "write for its input cells the units it converts from"));
}

TEST_CASE("workbook parity: the pounds formula's 8.34 is a note in lb/d and not needed in kg/d") {
    // mgd × mg/L × 8.34 = lb/d, with 8.34 lb per US gallon of water (the units need 8.3454;
    // common practice in US water treatment). In an SI sheet, ML/d × mg/L is already kg/d, so
    // the 8.34 pasted there makes the feed 8.34 times too large. 8.43 is neither.
    const check_report r = check_one_sheet("Feed", sheet_of({
                                                       {"4.57", "mgd"},         // B2
                                                       {"2.5", "mg/L"},         // B3
                                                       {"=B2*B3*8.34", "lb/d"}, // B4: note
                                                       {"=B2*B3*8.43", "lb/d"}, // B5: wrong
                                                       {"17.3", "ML/d"},        // B6
                                                       {"=B6*B3*8.34", "kg/d"}, // B7: wrong
                                                       {"=B6*B3", "kg/d"},      // B8: right
                                                   }));
    CHECK(cell_findings(r) == std::vector<std::string>{"Feed!B4 trade-constant",
                                                       "Feed!B5 unit-scale", "Feed!B7 unit-scale"});
    const diagnostic* pasted = finding(r, "Feed!B7", rules::unit_scale);
    REQUIRE(pasted != nullptr);
    CHECK(says(*pasted, "the factor 8.34 is not needed"));
    CHECK(says(*pasted, "8.34 is the weight of a US gallon of water"));
}

TEST_CASE("workbook parity: the pounds formula in the notation, right and pasted into SI") {
    const std::string declarations = "Q : ML/d\nQ_US : mgd\nc : mg/L\nW : kg/d\nW_US : lb/d\n";
    const check_report right = check_after(declarations, "W_US = Q_US*c*8.34");
    CHECK(problems_in(right) == 0);
    CHECK(count_of(right, rules::trade_constant) == 1);
    each_fails_with(declarations, {"W = Q*c*8.34", "W = Q*c/8.34", "W = 8.34*Q*c"},
                    rules::unit_scale);
    CHECK(problems_in(check_after(declarations, "W = Q*c")) == 0);
}

TEST_CASE("workbook parity: a liquid column is what a gauge at its foot reads") {
    // p = ρ·g·h, the pressure of a column above the atmosphere (any fluid mechanics text, e.g.
    // White, Fluid Mechanics, ch. 2, from memory); 0.433 psi per ft of water and 62.4 lb/ft³
    // over 144 in²/ft² (common practice). Without g, or without the /144, they stay errors.
    const check_report r = check_one_sheet("Tank", sheet_of({
                                                       {"999.8", "kg/m3"},           // B2
                                                       {"9.81", "m/s2"},             // B3
                                                       {"6.5", "m"},                 // B4
                                                       {"=B2*B3*B4/1000", "kPa(g)"}, // B5: right
                                                       {"=B2*B3*B4/1000", "kPa"}, // B6: as before
                                                       {"=B2*B4/1000", "kPa(g)"}, // B7: no g
                                                       {"=B2*B3*B4", "kPa(g)"},   // B8: no /1000
                                                       {"0.83", "-"},             // B9
                                                       {"22", "ft"},              // B10
                                                       {"=0.433*B9*B10", "psig"}, // B11: right
                                                       {"=62.4*B9*B10/144", "psig"}, // B12: right
                                                       {"=62.4*B9*B10", "psig"},     // B13: no /144
                                                   }));
    // The right cells have at most a note that reads 9.81, 0.433 or 62.4.
    for (const auto& f : cell_findings(r)) {
        CAPTURE(f);
        const bool wrong_cell = f.rfind("Tank!B7 ", 0) == 0 || f.rfind("Tank!B8 ", 0) == 0 ||
                                f.rfind("Tank!B13 ", 0) == 0;
        CHECK((wrong_cell || f.find("gravity-number") != std::string::npos));
    }
    CHECK(finding(r, "Tank!B7", rules::result_unit) != nullptr);
    CHECK(error_at(r, "Tank!B8"));
    // The note says how to write the number outright in a workbook, not in the notation.
    const diagnostic* water = finding(r, "Tank!B11", rules::gravity_number);
    REQUIRE(water != nullptr);
    CHECK(says(*water, "in cells that hold their units"));
    CHECK_FALSE(says(*water, "declared"));
    CHECK(finding(r, "Tank!B13", rules::result_unit) != nullptr);
    CHECK(problems_in(r) == 3);
}

TEST_CASE("workbook parity: conversions written as a sum, °C to °F and barg to kPa absolute") {
    // °F = 1.8·°C + 32; kPa = 100·barg + 101.325, psia = 14.5·barg + 14.7 (NIST SP 811 (2008),
    // B.8; the standard atmosphere, SI Brochure 9th ed., Table 8). The wrong factor, or the
    // atmosphere left out of an absolute cell, stays an error.
    const check_report r =
        check_one_sheet("Conv", sheet_of({
                                    {"46", "°C"},                // B2
                                    {"=B2*1.8+32", "°F"},        // B3: right
                                    {"=B2*9/5+32", "°F"},        // B4: right
                                    {"=B2/1.8+32", "°F"},        // B5: wrong way round
                                    {"7.5", "barg"},             // B6
                                    {"=B6*100+101.325", "kPa"},  // B7: right
                                    {"=B6*100", "kPa(g)"},       // B8: right
                                    {"=B6*14.5+14.7", "psia"},   // B9: right
                                    {"=B6*1000+101.325", "kPa"}, // B10: wrong factor
                                    {"=B6*100", "kPa"},          // B11: no atmosphere
                                }));
    CHECK(cell_findings(r).size() == 3);
    CHECK(error_at(r, "Conv!B5"));
    // °F is a scale with a zero of its own, not an absolute temperature.
    for (const auto& d : r.diagnostics)
        CHECK(d.message.find("'°F' (beside it in C5), is an absolute") == std::string::npos);
    CHECK(error_at(r, "Conv!B10"));
    CHECK(finding(r, "Conv!B11", rules::offset_scale) != nullptr);
}

TEST_CASE("workbook parity: a Fahrenheit conversion run the wrong way is named as such") {
    // t_F = 1.8·t_C + 32 and t_C = (t_F − 32)/1.8 (NIST SP 811 (2008), B.8). The second applied
    // to a °C reading is no factor turned over: =(B2-32)*1.8 would still be wrong, so the
    // finding gives the other conversion.
    const check_report r =
        check_one_sheet("Conv", sheet_of({
                                    {"46", "°C"},           // B2
                                    {"=(B2-32)/1.8", "°F"}, // B3: the °F-to-°C conversion
                                    {"115", "°F"},          // B4
                                    {"=1.8*B4+32", "°C"},   // B5: the °C-to-°F conversion
                                    {"=(B4-32)/1.8", "°C"}, // B6: right
                                }));
    const diagnostic* to_f = finding(r, "Conv!B3", rules::unit_scale);
    REQUIRE(to_f != nullptr);
    CHECK(says(*to_f, "runs the wrong way for °F"));
    CHECK(says(*to_f, "the conversion runs the other way, =B2*1.8+32"));
    // The other way, a °C-to-°F conversion under °C, gives a reading on the °F scale.
    CHECK(finding(r, "Conv!B5", rules::offset_scale) != nullptr);
    CHECK(cell_findings(r).size() == 2);
}

TEST_CASE("workbook parity: Barlow's wall stress from a gauge pressure") {
    // σ = p·D/(2·t), the wall carries the pressure above the atmosphere outside it (Barlow's
    // formula, ASME B31.3 304.1.2, from memory). kPa·m/mm is MPa with no factor; a *1000 there
    // is not needed. A gauge reading in a gas law stays an error.
    const check_report r =
        check_one_sheet("Wall", sheet_of({
                                    {"63.7", "kPa(g)"},                // B2
                                    {"32", "m"},                       // B3
                                    {"300", "mm"},                     // B4
                                    {"=B2*B3/(2*B4)", "MPa"},          // B5: right
                                    {"=B2*B3/(2*B4)*1000", "MPa"},     // B6: not needed
                                    {"150", "psig"},                   // B7
                                    {"24", "in"},                      // B8
                                    {"0.375", "in"},                   // B9
                                    {"=B7*B8/(2*B9)", "psi"},          // B10: right
                                    {"2", "m3"},                       // B11
                                    {"8.314", "J/(mol*K)"},            // B12
                                    {"300", "K"},                      // B13
                                    {"=B2*1000*B11/(B12*B13)", "mol"}, // B14: gauge in a gas law
                                }));
    CHECK(cell_findings(r) ==
          std::vector<std::string>{"Wall!B14 offset-scale", "Wall!B6 unit-scale"});
}

TEST_CASE("workbook parity: unit text may use the units a sidecar defines with measure") {
    // Gas density ρ = p·M/(Z·R·T) with R = 10.73 psia·ft³/(lbmole·°R), the pound-mole spelled as a
    // sheet may (common practice in gas engineering); here defined by a measure line, 453.59237 mol
    // (NIST SP 811 (2008), B.8). With T in °F the density is wrong, reported once the units beside
    // the cells are read; with °R it is right.
    const std::string sheet = sheet_of({
        {"114.7", "psia"},                 // B2
        {"18.9", "lb/lbmole"},             // B3
        {"0.92", "-"},                     // B4
        {"10.73", "psia·ft³/(lbmole·°R)"}, // B5
        {"85", "°F"},                      // B6
        {"=B6+459.67", "°R"},              // B7
        {"=B2*B3/(B4*B5*B7)", "lb/ft³"},   // B8: right
        {"=B2*B3/(B4*B5*B6)", "lb/ft³"},   // B9: °F in a gas law
    });
    const check_report with_measure =
        check_one_sheet("Gas", sheet, "measure lbmole = 453.59237 mol \"pound-mole\"\n");
    CHECK(cell_findings(with_measure) == std::vector<std::string>{"Gas!B9 offset-scale"});
    CHECK(with_measure.inputs_without_units == 0);

    // Without the measure line the text is not read; the warning names the text and the word.
    const check_report without = check_one_sheet("Gas", sheet);
    const diagnostic* input = finding(without, "Gas!B5", rules::no_unit);
    REQUIRE(input != nullptr);
    CHECK(
        says(*input, "the text beside it in C5, 'psia·ft³/(lbmole·°R)', does not read as a unit"));
    CHECK(says(*input, "unknown unit 'lbmole'"));
    CHECK(says(*input, "measure lbmole = <size> <known unit>"));
    CHECK_FALSE(says(*input, "write its unit in the cell to its right"));
}

TEST_CASE("workbook parity: a unit in a column's heading that does not read is said") {
    // Illuminance in foot-candles from lux: 1 fc = 1 lm/ft² = 10.764 lx (NIST SP 811 (2008),
    // App. B). A heading 'Target [fc]' plumb cannot read left the column's results unchecked,
    // and a slip in them passed without a word.
    const auto text = [](const std::string& at, const std::string& t) {
        return "<c r=\"" + at + "\" t=\"inlineStr\"><is><t>" + t + "</t></is></c>";
    };
    const std::string sheet = "<worksheet><sheetData><row r=\"1\">" + text("A1", "Target [lx]") +
                              text("B1", "Target [fc]") + text("C1", "Note (see A)") +
                              "</row><row r=\"2\"><c r=\"A2\"><v>300</v></c>"
                              "<c r=\"B2\"><f>A2*10.764</f><v>0</v></c>"
                              "<c r=\"C2\"><f>A2/2</f><v>0</v></c></row></sheetData></worksheet>";
    const check_report r = check_one_sheet("Rooms", sheet);
    const diagnostic* unread = finding(r, "Rooms!B2", rules::no_unit);
    REQUIRE(unread != nullptr);
    CHECK(says(*unread, "does not read as a unit"));
    CHECK(says(*unread, "the unit in its column's heading in B1, 'fc'"));
    // Words in parentheses that are no unit are left alone.
    CHECK(finding(r, "Rooms!C2", rules::no_unit) == nullptr);
    // A unit in words, beside a cell: "imp gal", which the table does not hold (a formula's
    // result unchecked had passed). "US gal" reads as the US gallon: 264.2 gal per m³ (NIST
    // SP 811 (2008), B.8: 3.785412 L) is right.
    const check_report words = check_one_sheet("Tank", sheet_of({
                                                           {"50", "m3"},            // B2
                                                           {"=B2*220", "imp gal"},  // B3
                                                           {"=B2*2", "see note"},   // B4
                                                           {"=B2*264.2", "US gal"}, // B5
                                                           {"=B2/264.2", "US gal"}, // B6
                                                       }));
    const diagnostic* gallons = finding(words, "Tank!B3", rules::no_unit);
    REQUIRE(gallons != nullptr);
    CHECK(says(*gallons, "'imp gal', does not read as a unit"));
    CHECK(finding(words, "Tank!B4", rules::no_unit) == nullptr);
    CHECK_FALSE(error_at(words, "Tank!B5"));
    CHECK(error_at(words, "Tank!B6"));
    // With fc defined in the sidecar, the slip (10.764 the wrong way round) is the finding.
    const check_report defined =
        check_one_sheet("Rooms", sheet, "measure fc = 10.7639 lx \"foot-candle\"\n");
    CHECK(finding(defined, "Rooms!B2", rules::no_unit) == nullptr);
    CHECK(error_at(defined, "Rooms!B2"));
}

TEST_CASE("workbook parity: Hazen-Williams in SI with /1000 inside its powers") {
    // h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) with Q in m³/s and D in m (common practice): typed
    // with Q in L/s and D in mm, each over 1000 inside its power, the 1000s convert; they are
    // no reference values, and no factor "not needed".
    const check_report r = check_one_sheet(
        "Main", sheet_of({
                    {"30", "L/s"},                                                // B2
                    {"150", "mm"},                                                // B3
                    {"120", "-"},                                                 // B4
                    {"500", "m"},                                                 // B5
                    {"=10.67*B5*(B2/1000)^1.852/(B4^1.852*(B3/1000)^4.87)", "m"}, // B6
                    {"=10.67*B5*(B2/1000)^1.852/(B4^1.852*B3^4.87)", "m"},        // B7
                }));
    CHECK(finding(r, "Main!B6", rules::unit_scale) == nullptr);
    CHECK_FALSE(error_at(r, "Main!B6"));
    // The bore left in mm is still an error.
    CHECK(error_at(r, "Main!B7"));
}

TEST_CASE("workbook parity: the molar volume follows the cell's reference state") {
    // c = C·M/V_m, V_m = R·T/p = 22.414 L/mol at 0 °C and 101.325 kPa (CODATA 2018's R), the
    // normal cubic metre's state (DIN 1343); 24.45 is 25 °C's, 8.3 % off.
    const check_report r = check_one_sheet("Report", sheet_of({
                                                         {"120", "ppm"},             // B2
                                                         {"46.01", "g/mol"},         // B3
                                                         {"=B2*B3/24.45", "mg/Nm3"}, // B4
                                                         {"=B2*B3/22.41", "mg/Nm3"}, // B5
                                                         {"=B2*B3/24.45", "mg/m3"},  // B6
                                                     }));
    const diagnostic* off = finding(r, "Report!B4", rules::unit_scale);
    REQUIRE(off != nullptr);
    CHECK(says(*off, "8.3 % too small"));
    CHECK(finding(r, "Report!B5", rules::unit_scale) == nullptr);
    CHECK(finding(r, "Report!B6", rules::unit_scale) == nullptr);
}

TEST_CASE("workbook parity: ft per ton beside a load in TR says which ton 'ton' is") {
    // Bore length per ton of refrigeration, 1 TR = 12 000 Btu/h (NIST SP 811 (2008), B.8); a
    // 'ton' in a unit text is the short ton of 2000 lb, a mass (common practice: the US trades'
    // ft/ton is per TR).
    const check_report r = check_one_sheet("Design", sheet_of({
                                                         {"1800", "ft"},       // B2
                                                         {"12", "TR"},         // B3
                                                         {"=B2/B3", "ft/ton"}, // B4
                                                         {"=B2/B3", "ft/TR"},  // B5
                                                     }));
    const diagnostic* ton = finding(r, "Design!B4", rules::result_unit);
    REQUIRE(ton != nullptr);
    CHECK(says(*ton, "for a ton of refrigeration (12 000 Btu/h) write TR"));
    CHECK(finding(r, "Design!B5", rules::result_unit) == nullptr);
}

TEST_CASE("workbook parity: a note names the sheet of a cell on another sheet") {
    // A sling's share of a lifted load: the percentage used as a fraction (common practice:
    // share = load · percent / 100). Lift!C8 and Slings!C8 are different cells, and the notes
    // must say which is which.
    const auto cell = [](const std::string& at, const std::string& inner) {
        return "<c r=\"" + at + "\"" + inner + "</c>";
    };
    const auto text = [&](const std::string& at, const std::string& t) {
        return cell(at, " t=\"inlineStr\"><is><t>" + t + "</t></is>");
    };
    const std::string lift = "<worksheet><sheetData><row r=\"8\">" + cell("C8", "><v>12</v>") +
                             text("D8", "t") + "</row></sheetData></worksheet>";
    const std::string slings = "<worksheet><sheetData><row r=\"8\">" + cell("C8", "><v>50</v>") +
                               text("D8", "%") + "</row><row r=\"9\">" +
                               cell("C9", "><f>Lift!C8*C8</f><v>0</v>") + text("D9", "t") +
                               "</row></sheetData></worksheet>";
    const std::string book = plumb::test::make_zip(
        {{"[Content_Types].xml",
          "<Types><Override PartName=\"/xl/workbook.xml\" ContentType=\"application/"
          "vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml\"/></Types>"},
         {"xl/workbook.xml", "<workbook><sheets><sheet name=\"Lift\" sheetId=\"1\" id=\"rId1\"/>"
                             "<sheet name=\"Slings\" sheetId=\"2\" id=\"rId2\"/></sheets>"
                             "</workbook>"},
         {"xl/_rels/workbook.xml.rels",
          "<Relationships><Relationship Id=\"rId1\" Target=\"worksheets/sheet1.xml\"/>"
          "<Relationship Id=\"rId2\" Target=\"worksheets/sheet2.xml\"/></Relationships>"},
         {"xl/worksheets/sheet1.xml", lift},
         {"xl/worksheets/sheet2.xml", slings}});
    plumb::test::temp_dir dir;
    const check_report r = check_paths({dir.write("lift-plan.xlsx", book)});
    INFO(render_text(r));
    const diagnostic* share = finding(r, "Slings!C9", rules::unit_scale);
    REQUIRE(share != nullptr);
    CHECK(says(*share, "Lift!C8 is in t"));
    CHECK_FALSE(says(*share, "  C8 is in t"));
}

TEST_CASE("workbook parity: a measure defined from another is read in unit text too") {
    // 1 lbmole = 453.59237 mol (NIST SP 811 (2008), B.8); a thousand of them a day, beside
    // others the sheet does not use, so only the lines a text names are read with it.
    std::string sidecar;
    for (int k = 0; k < 200; ++k)
        sidecar += "measure unused" + std::to_string(k) + " = " + std::to_string(k + 2) + " m\n";
    sidecar += "measure lbmole = 453.59237 mol\nmeasure klbmole = 1000 lbmole\n";
    const check_report r = check_one_sheet("Flow",
                                           sheet_of({
                                               {"12", "klbmole/d"},       // B2
                                               {"=B2*1000", "lbmole/d"},  // B3: right
                                               {"=B2*1000", "klbmole/d"}, // B4: not needed
                                           }),
                                           sidecar);
    CHECK(cell_findings(r) == std::vector<std::string>{"Flow!B4 unit-scale"});
    CHECK(r.inputs_without_units == 0);
}

TEST_CASE("workbook parity: a formula cell beside a unit text that does not read is told so") {
    const check_report r = check_one_sheet("U", sheet_of({
                                                    {"28.97", "kg/kmol"},   // B2
                                                    {"=B2*2", "lb/lbmole"}, // B3: unknown word
                                                    {"=B2*3", "kg/kmol"},   // B4: read
                                                    {"=B2*4", "checked"},   // B5: a remark
                                                    {"=B2*5", "tons"},      // B6: a plural unit
                                                    {"=B2*6", "plg"},       // B7: one letter off
                                                    {"=B2*7", "OK"},        // B8: a remark
                                                }));
    CHECK(cell_findings(r) ==
          std::vector<std::string>{"U!B3 no-unit", "U!B6 no-unit", "U!B7 no-unit"});
    const diagnostic* d = finding(r, "U!B3", rules::no_unit);
    REQUIRE(d != nullptr);
    CHECK(says(*d, "'lb/lbmole'"));
    CHECK(says(*d, "unknown unit 'lbmole'"));
}

TEST_CASE("workbook parity: how far off the value shown is counts the conversions written") {
    // The figure is the value shown over the value the formula means, with the numbers that
    // are conversions (*1000, /24, *5.615) taken as such and the coefficients (0.87) not.
    // 1 bbl = 5.614583 ft³ (NIST SP 811 (2008), B.8).
    const check_report r = check_one_sheet(
        "Off", sheet_of({
                   {"1000", "m3/h"},                 // B2
                   {"500", "mm"},                    // B3
                   {"=B2/(B3*B3/1000000)", "m/s"},   // B4: /3600 missing: 3600 too large
                   {"45", "kN*m"},                   // B5
                   {"500", "N/mm2"},                 // B6
                   {"=B5*1000/(0.87*B6*B3)", "mm2"}, // B7: *1000 for *10⁶: 1000 too small
                   {"2400", "bbl/d"},                // B8
                   {"5", "min"},                     // B9
                   {"=B8*5.615/24*B9", "ft3"},       // B10: per hour: 60 too large
               }));
    const auto figure = [&](const char* cell, const char* words) {
        const diagnostic* d = finding(r, cell, rules::unit_scale);
        REQUIRE(d != nullptr);
        CAPTURE(d->message);
        CHECK(says(*d, words));
    };
    figure("Off!B4", "the value shown is 3600 times too large");
    figure("Off!B7", "the value shown is 1000 times too small");
    figure("Off!B10", "the value shown is 60 times too large");
    // A number of four digits that converts nothing here (0.5933 lb/yd³ per kg/m³ on a density
    // already in lb/ft³; NIST SP 811 (2008), B.8: 1 lb/ft³ = 16.0185 kg/m³) is no formula's
    // own coefficient: the figure is the units' alone, and the number is named.
    const check_report density = check_one_sheet("Mix", sheet_of({
                                                            {"150", "lb/ft3"},       // B2
                                                            {"=B2*0.5933", "kg/m3"}, // B3
                                                        }));
    const diagnostic* d = finding(density, "Mix!B3", rules::unit_scale);
    REQUIRE(d != nullptr);
    CHECK(says(*d, "its units are 16.0185 times too small for it, its coefficient 0.5933 aside"));
    CHECK(says(*d, "0.5933 counted as a coefficient"));
}

TEST_CASE("workbook parity: a heat flow times a °C reading is told to take the difference") {
    // Q = U·A·ΔT (any heat transfer text, e.g. CIBSE Guide A, ch. 3, from memory): adding 273.15
    // to the inside temperature would pass the check and give a heat loss many times too large.
    const check_report r = check_one_sheet("Heat", sheet_of({
                                                       {"21", "°C"},            // B2
                                                       {"-3", "°C"},            // B3
                                                       {"1.6", "W/(m2*K)"},     // B4
                                                       {"12", "m2"},            // B5
                                                       {"=B4*B5*B2", "W"},      // B6: a reading
                                                       {"=B4*B5*(B2-B3)", "W"}, // B7: right
                                                   }));
    CHECK(cell_findings(r) == std::vector<std::string>{"Heat!B6 offset-scale"});
    const diagnostic* d = finding(r, "Heat!B6", rules::offset_scale);
    REQUIRE(d != nullptr);
    REQUIRE_FALSE(d->notes.empty());
    CHECK(d->notes.front().message.find("multiplies a temperature difference") !=
          std::string::npos);
}

TEST_CASE("workbook cells checked are listed with their result when formulas are recorded") {
    // The JSON lists every formula checked, the passing ones too, so a tool reading it can see
    // which cells were looked at; a workbook's cells count as its formulas. A reviewer signs
    // off cells, not plumb's listing of them: the sign-off report lists each formula cell with
    // its formula, the unit written for it and its findings, placed as Sheet!Cell, and hashes
    // the workbook's own bytes once, as checked.
    plumb::test::temp_dir dir;
    const auto path = dir.write(
        "S.xlsx", plumb::test::xlsx_of_one_sheet(
                      "S", sheet_of({{"17.28", "m"}, {"=B2*1000", "mm"}, {"=B2*1000", "m"}})));
    plumb::check_options options;
    options.record_formulas = true;
    const check_report r = plumb::check_paths({path}, options);
    REQUIRE(r.formulas.size() == 2);
    std::vector<std::string> graded;
    for (const auto& f : r.formulas) {
        const plumb::cell_place* c = f.where.file->cell_at(f.where.range.begin);
        REQUIRE(c != nullptr);
        graded.push_back(cell_text(*c) + " " +
                         (f.worst ? std::string(f.worst == severity::error ? "error" : "other")
                                  : std::string("passed")));
    }
    CHECK(graded == std::vector<std::string>{"S!B3 passed", "S!B4 error"});
    const std::string html = plumb::render_signoff_html(r, plumb::signoff_context{});
    const auto has = [&](std::string_view text) { return html.find(text) != std::string::npos; };
    CHECK(has("<td class=\"mono\">S!B3</td><td class=\"mono\">=B2*1000</td>"
              "<td class=\"mono\">mm</td><td><div class=\"ok\">consistent</div>"));
    CHECK(has("<td class=\"mono\">S!B4</td><td class=\"mono\">=B2*1000</td>"
              "<td class=\"mono\">m</td><td><div class=\"finding error\">"));
    CHECK(has(path.string() + ":S!B4</span>"));
    CHECK(has("checked (workbook)"));
    CHECK_FALSE(has("read (dictionary or accepted findings)"));
    CHECK_FALSE(has("Findings in other files"));
}

TEST_CASE("workbook parity: a threshold typed as a number in IF is in the compared cell's unit") {
    // A spreadsheet's numbers carry no units: =IF(B2<25,...) compares a temperature difference
    // with 25 of its own kelvins, as the engineer reads it (common practice). Two cells of
    // different dimensions compared stay an error.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"4.5", "K"},                // B2: a temperature difference
                                 {"=IF(B2&lt;25,1,0)", "-"},  // B3: right (&lt; is < in XML)
                                 {"12", "m"},                 // B4
                                 {"=IF(B2&lt;B4,1,0)", "-"},  // B5: K against m
                                 {"=IF(25&gt;B2,B2,0)", "K"}, // B6: right, the number first
                             }));
    REQUIRE(r.cells_checked == 3);
    CHECK_FALSE(error_at(r, "S!B3"));
    CHECK(error_at(r, "S!B5"));
    CHECK_FALSE(error_at(r, "S!B6"));
}

TEST_CASE("workbook parity: a conversion in IF's condition serves the condition alone") {
    // =IF(B2*1000>B3, B2*1000-B3, 0) with B2 in MW and B3 in kW converts MW to kW twice, once
    // for the comparison and once for the branch: both are right (1 MW = 1000 kW, SI Brochure
    // 9th ed., Table 7). A conversion the wrong way round in the condition stays an error.
    const check_report r = check_one_sheet(
        "S", sheet_of({
                 {"3.1", "MW"},                             // B2: peak demand
                 {"2400", "kW"},                            // B3: heat pump output
                 {"=IF(B2*1000&gt;B3,B2*1000-B3,0)", "kW"}, // B4: right
                 {"=IF(B2/1000&gt;B3,B2*1000-B3,0)", "kW"}, // B5: condition the wrong way
                 {"=IF(B2&gt;B3,B2*1000-B3,0)", "kW"},      // B6: condition not converted
                 {"=IF(B2*1000&gt;B3,B2*1000-B3,0)", "MW"}, // B7: kW into an MW cell
             }));
    REQUIRE(r.cells_checked == 4);
    CHECK_FALSE(error_at(r, "S!B4"));
    CHECK(error_at(r, "S!B5"));
    CHECK(error_at(r, "S!B6"));
    CHECK(error_at(r, "S!B7"));
}

TEST_CASE("workbook parity: a bare number among MAX's, MIN's or IF's values is in their unit") {
    // =MAX(B2, 0.3) with B2 in m: a floor of 0.3 m, as the engineer typed it, for a spreadsheet's
    // numbers carry no units (common practice). A cell of another dimension stays an error, and
    // so does a number where no argument has a unit to lend it.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"0.45", "m"},                // B2: a cover depth
                                 {"=MAX(B2,0.3)", "m"},        // B3: right, a floor
                                 {"=MIN(1.2,B2)", "m"},        // B4: right, a cap
                                 {"=IF(B2&gt;1,B2,0.6)", "m"}, // B5: right, a default
                                 {"12", "kN"},                 // B6
                                 {"=MAX(B2,B6)", "m"},         // B7: m against kN
                                 {"=MAX(B2,0.3)*1000", "mm"},  // B8: right, converted
                                 {"=MAX(B2,0.3)", "mm"},       // B9: m into mm
                                 {"250", "mm"},                // B10
                                 {"=MIN(B10/1000/B2,2)", "-"}, // B11: right, a ratio capped
                             }));
    REQUIRE(r.cells_checked == 7);
    CHECK_FALSE(error_at(r, "S!B3"));
    CHECK_FALSE(error_at(r, "S!B4"));
    CHECK_FALSE(error_at(r, "S!B5"));
    CHECK(error_at(r, "S!B7"));
    CHECK_FALSE(error_at(r, "S!B8"));
    CHECK(error_at(r, "S!B9"));
    CHECK_FALSE(error_at(r, "S!B11"));
}

TEST_CASE("workbook parity: a lookup's key and its table column agree in their zeros") {
    // Saturated steam tables are in absolute pressure (IAPWS-IF97; common practice): looked up
    // with a gauge reading the row is one atmosphere off. 1 atm = 1.01325 bar (SI Brochure 9th
    // ed., Table 8).
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"5", "bar"},                    // B2: table, absolute
                                 {"6", "bar"},                    // B3
                                 {"7", "bar"},                    // B4
                                 {"5.2", "barg"},                 // B5: steam header gauge
                                 {"=VLOOKUP(B5,B2:B4,1)", "bar"}, // B6: gauge key
                                 {"=B5+1.01325", "bar"},          // B7: absolute
                                 {"=VLOOKUP(B7,B2:B4,1)", "bar"}, // B8: right
                             }));
    CHECK(error_at(r, "S!B6"));
    CHECK_FALSE(error_at(r, "S!B7"));
    CHECK_FALSE(error_at(r, "S!B8"));
}

TEST_CASE("workbook parity: a number typed into a sum of cells of one unit is in that unit") {
    // An anchor's embedment plus plate thickness plus grout and projection allowances typed
    // as numbers, all in mm (common practice); 1 m = 1000 mm (SI Brochure 9th ed., Table 7).
    // Cells of different units, or of pressures, keep their findings.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"300", "mm"},                // B2: embedment
                                 {"40", "mm"},                 // B3: plate
                                 {"=(B2+B3+50+75)/1000", "m"}, // B4: right
                                 {"=B2+B3+50+75", "m"},        // B5: mm into m
                                 {"0.3", "m"},                 // B6
                                 {"=B2+B6+50", "mm"},          // B7: mm beside m
                                 {"250", "kPa"},               // B8: absolute
                                 {"=B8+101.325", "kPa"},       // B9: the atmosphere twice
                             }));
    CHECK_FALSE(error_at(r, "S!B4"));
    CHECK(error_at(r, "S!B5"));
    CHECK(error_at(r, "S!B7"));
    CHECK(error_at(r, "S!B9"));
}

TEST_CASE("workbook parity: a pressure whose row label says it is a drop is a difference") {
    // A pump's discharge from its suction gauge plus drops typed in psi, labelled as losses in
    // column A (common practice); 1 atm = 14.696 psi (NIST SP 811 (2008), B.8). An unlabelled
    // psi cell added to a gauge reading stays the atmosphere, and the sum an absolute pressure.
    const auto labelled = [](int r, const std::string& label, const std::string& value,
                             const std::string& unit) {
        const std::string n = std::to_string(r);
        std::string row = plumb::test::value_and_unit_row(r, value, unit);
        row.insert(row.find('>') + 1,
                   "<c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label + "</t></is></c>");
        return row;
    };
    const std::string sheet =
        "<worksheet><sheetData>" + labelled(2, "Suction pressure", "35", "psig") +
        labelled(3, "Friction loss", "12", "psi") + labelled(4, "Static rise", "20", "psi") +
        labelled(5, "Discharge pressure", "=B2+B3+B4", "psig") +
        labelled(6, "Barometer", "14.2", "psi") +
        labelled(7, "Discharge, absolute", "=B2+B6", "psig") +
        labelled(8, "Discharge, absolute", "=B2+B6", "psia") + "</sheetData></worksheet>";
    const check_report r = check_one_sheet("S", sheet);
    CHECK_FALSE(error_at(r, "S!B5"));
    CHECK(error_at(r, "S!B7"));
    CHECK_FALSE(error_at(r, "S!B8"));
}

TEST_CASE("workbook parity: a large power of ten is a conversion, not water's density") {
    // A plate's mass from its sides in mm and aluminium's 2700 kg/m³ typed as a number
    // (common practice): 1 m³ = 10⁹ mm³ (SI Brochure 9th ed., Table 7). The 2700 carries no
    // unit, so the cell computes a volume; the 10⁹ must not be read as one over water's
    // density. Steel's 7850 is read as the density it is, the 10⁹ as the conversion.
    for (const char* density : {"2700", "7850"}) {
        CAPTURE(density);
        const check_report r =
            check_one_sheet("S", sheet_of({
                                     {"400", "mm"}, // B2
                                     {"400", "mm"}, // B3
                                     {"30", "mm"},  // B4
                                     {std::string("=B2*B3*B4*") + density + "/1000000000", "kg"},
                                 }));
        const diagnostic* note = finding(r, "S!B5", rules::trade_constant);
        if (std::string_view(density) == "2700") {
            CHECK(finding(r, "S!B5", rules::result_unit) != nullptr);
            CHECK(note == nullptr);
        } else {
            CHECK(finding(r, "S!B5", rules::result_unit) == nullptr);
            REQUIRE(note != nullptr);
            CHECK(note->message.find("density of steel") != std::string::npos);
        }
    }
}

TEST_CASE("workbook parity: readings on scales with different zeros are not compared") {
    // A tube trailer's arrival pressure in bar a against its MAWP in bar g: 1.01325 bar apart
    // (the standard atmosphere, 101.325 kPa: ISO 2533, from memory), and the IF reads OK when it
    // should not. The same against a limit in bar a, or a gauge reading against a gauge limit,
    // is right; MAX of the two scales is the same slip.
    const check_report r = check_one_sheet("S", sheet_of({
                                                    {"251", "bar a"},           // B2
                                                    {"250", "bar g"},           // B3: MAWP
                                                    {"=IF(B2&gt;B3,1,0)", "-"}, // B4: a against g
                                                    {"=IF(B2&gt;B3+1.01325,1,0)", "-"}, // B5: right
                                                    {"=IF(B2-1.01325&gt;B3,1,0)", "-"}, // B6: right
                                                    {"=MAX(B2,B3)", "bar"}, // B7: a beside g
                                                    {"=MAX(B2-1.01325,B3)", "bar g"}, // B8: right
                                                }));
    REQUIRE(r.cells_checked == 5);
    CHECK(error_at(r, "S!B4"));
    CHECK_FALSE(error_at(r, "S!B5"));
    CHECK_FALSE(error_at(r, "S!B6"));
    CHECK(error_at(r, "S!B7"));
    CHECK_FALSE(error_at(r, "S!B8"));
}

TEST_CASE("workbook parity: a number over or under one cell, raised to a fractional power") {
    // A radiator's output at another mean temperature difference, Φ = Φ50·(ΔT/50)^n with n
    // about 1.3 (EN 442-2, from memory): the 50 is 50 K, in the cell's unit, as radiator
    // schedules type it. Squared, the ratio keeps its kelvins; into a kW cell the output is
    // still 1000 times off.
    const check_report r = check_one_sheet("S", sheet_of({
                                                    {"1200", "W"}, // B2: output at ΔT 50 K
                                                    {"35", "K"},  // B3: mean temperature difference
                                                    {"1.3", "-"}, // B4: radiator exponent
                                                    {"=B2*(B3/50)^B4", "W"},  // B5: right
                                                    {"=B2/(50/B3)^B4", "W"},  // B6: right
                                                    {"=B2*(B3/50)^2", "W"},   // B7: K² left over
                                                    {"=B2*(B3/50)^B4", "kW"}, // B8: W into kW
                                                }));
    REQUIRE(r.cells_checked == 4);
    CHECK_FALSE(error_at(r, "S!B5"));
    CHECK_FALSE(error_at(r, "S!B6"));
    CHECK(error_at(r, "S!B7"));
    CHECK(error_at(r, "S!B8"));
}

TEST_CASE("workbook parity: SUMPRODUCT keeps its arguments' units") {
    // Energy from power and hours, Σ P·t (SI Brochure 9th ed., Table 8: 1 kW·h = 3.6 MJ): the
    // product of a kW column and an h column is in kWh, and into an MWh cell it needs /1000.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"120", "kW"},                            // B2
                                 {"80", "kW"},                             // B3
                                 {"6000", "h"},                            // B4
                                 {"4000", "h"},                            // B5
                                 {"=SUMPRODUCT(B2:B3,B4:B5)", "kWh"},      // B6: right
                                 {"=SUMPRODUCT(B2:B3,B4:B5)/1000", "MWh"}, // B7: right
                                 {"=SUMPRODUCT(B2:B3,B4:B5)", "MWh"},      // B8: 1000 off
                             }));
    REQUIRE(r.cells_checked == 3);
    CHECK_FALSE(error_at(r, "S!B6"));
    CHECK_FALSE(error_at(r, "S!B7"));
    CHECK(error_at(r, "S!B8"));
}

TEST_CASE("workbook parity: a formula cell whose row label says it holds a difference") {
    // A cooling tower's range (hot less cold water) and approach (cold water less wet-bulb),
    // in °F as US sheets write them (common practice): differences of readings, in a cell
    // whose unit is the scale's. A mean on a row labelled "Mean / range" is a reading; a reading
    // in a cell labelled otherwise, or a sum of readings labelled a range, stays an error.
    const auto labelled = [](int r, const std::string& label, const std::string& value,
                             const std::string& unit) {
        const std::string n = std::to_string(r);
        std::string row = plumb::test::value_and_unit_row(r, value, unit);
        row.insert(row.find('>') + 1,
                   "<c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label + "</t></is></c>");
        return row;
    };
    const std::string sheet = "<worksheet><sheetData>" +
                              labelled(2, "Design wet-bulb", "78", "°F") +
                              labelled(3, "Hot water to tower", "95", "°F") +
                              labelled(4, "Cold water from tower", "85", "°F") +
                              labelled(5, "Range (hot - cold water)", "=B3-B4", "°F") +
                              labelled(6, "Approach (cold water - wet-bulb)", "=B4-B2", "°F") +
                              labelled(7, "Mean / range", "=(B3+B4)/2", "°F") +
                              labelled(8, "Leaving water", "=B3-B4", "°F") +
                              labelled(9, "Range", "=B3+B4", "°F") + "</sheetData></worksheet>";
    const check_report r = check_one_sheet("S", sheet);
    CHECK_FALSE(error_at(r, "S!B5"));
    CHECK_FALSE(error_at(r, "S!B6"));
    CHECK_FALSE(error_at(r, "S!B7"));
    CHECK(error_at(r, "S!B8"));
    CHECK(error_at(r, "S!B9"));
}

TEST_CASE("workbook parity: a weighted mean of readings over the sum of its weights") {
    // Feedwater mixed from condensate and make-up, t = (m_1·t_1 + m_2·t_2)/(m_1 + m_2) (a heat
    // balance with one specific heat, common practice): a reading on the °C scale, as the
    // notation reads the same formula. Over one of the weights alone it is no mean.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"4200", "kg/h"},                 // B2: condensate
                                 {"85", "°C"},                     // B3
                                 {"1300", "kg/h"},                 // B4: make-up
                                 {"12", "°C"},                     // B5
                                 {"=(B2*B3+B4*B5)/(B2+B4)", "°C"}, // B6: right
                                 {"=(B2*B3+B4*B5)/B2", "°C"},      // B7: weights sum to 1.3
                             }));
    REQUIRE(r.cells_checked == 2);
    CHECK_FALSE(error_at(r, "S!B6"));
    CHECK(error_at(r, "S!B7"));
}

TEST_CASE("workbook parity: gas volumes at two reference temperatures") {
    // 1 Nm³ (0 °C) = 37.33 scf (60 °F), both at 101.325 kPa: the volume factor 35.3147 ft³/m³
    // (NIST SP 811 (2008), B.8) times 288.71/273.15 (ideal gas; the reference states from
    // memory). The volume factor alone is a warning, as in the notation; 37.33 passes.
    const check_report r = check_one_sheet("Air", sheet_of({
                                                      {"850", "scfm"},          // B2
                                                      {"=B2/37.33", "Nm³/min"}, // B3: right
                                                      {"=B2/35.31", "Nm³/min"}, // B4: 5.7 % off
                                                  }));
    CHECK(cell_findings(r) == std::vector<std::string>{"Air!B4 unit-scale"});
}

TEST_CASE("workbook parity: the advice for a reading put on another temperature scale") {
    // °F = 1.8·°C + 32, K = °C + 273.15 (NIST SP 811 (2008), 4.2.1.1 and B.8): the advice
    // names the conversion the cell needs, the 32 with the 1.8 between °C and °F.
    const check_report r = check_one_sheet("T", sheet_of({
                                                    {"85", "°C"},         // B2
                                                    {"=B2*1.8", "°F"},    // B3: no 32
                                                    {"=B2", "K"},         // B4: no 273.15
                                                    {"=B2*1.8+32", "°F"}, // B5: right
                                                    {"=B2+273.15", "K"},  // B6: right
                                                }));
    CHECK(cell_findings(r) == std::vector<std::string>{"T!B3 offset-scale", "T!B4 offset-scale"});
    const diagnostic* f = finding(r, "T!B3", rules::offset_scale);
    REQUIRE(f != nullptr);
    CHECK(says(*f, "(the reading)*1.8 + 32: the 32 and the 1.8 go together"));
    const diagnostic* k = finding(r, "T!B4", rules::offset_scale);
    REQUIRE(k != nullptr);
    CHECK(says(*k, "(the reading) + 273.15"));
}

TEST_CASE("workbook parity: empirical fits typed with bare constants, and more unit words") {
    // The Magnus fit p_ws = 0.61094 kPa·exp(17.625·t/(t + 243.04)) with t the °C reading
    // (Alduchov and Eskridge 1996, from memory) and Kirpich's t_c = 0.0195·L^0.77·S^-0.385 in
    // minutes from metres (from memory): a sheet cannot give the constant a unit, so it is read
    // as carrying the cell's, with a note. The grain (1/7000 lb) and the acre-foot read as units
    // (NIST SP 811 (2008), B.8), so a slip beside them is found.
    const check_report r =
        check_one_sheet("F", sheet_of({
                                 {"24", "°C"},                                   // B2
                                 {"=0.61094*EXP(17.625*B2/(B2+243.04))", "kPa"}, // B3
                                 {"850", "m"},                                   // B4
                                 {"0.012", "-"},                                 // B5
                                 {"=0.0195*B4^0.77*B5^-0.385", "min"},           // B6
                                 {"0.0142", "-"},                                // B7
                                 {"=B7*7000", "gr/lb"},                          // B8
                                 {"=B7*700", "gr/lb"},                           // B9: 10x
                                 {"5000", "m³"},                                 // B10
                                 {"=B10/1233.5", "acre-ft"},                     // B11
                                 {"=B10/43560", "acre-ft"},                      // B12
                             }));
    CHECK(cell_findings(r) == std::vector<std::string>{"F!B12 unit-scale", "F!B3 trade-constant",
                                                       "F!B6 trade-constant", "F!B9 unit-scale"});
}

TEST_CASE("workbook parity: the log-mean temperature difference as a difference of LNs") {
    // LMTD = (ΔT_1 - ΔT_2)/(LN(ΔT_1) - LN(ΔT_2)) (Kern, Process Heat Transfer, ch. 5, from
    // memory): the difference of two logarithms of one unit is the logarithm of a ratio.
    const check_report r = check_one_sheet("H", sheet_of({
                                                    {"42", "K"},                       // B2
                                                    {"18", "K"},                       // B3
                                                    {"=(B2-B3)/(LN(B2)-LN(B3))", "K"}, // B4
                                                    {"0.5", "m"},                      // B5
                                                    {"=(B2-B3)/(LN(B2)-LN(B5))", "K"}, // B6
                                                }));
    CHECK(cell_findings(r) ==
          std::vector<std::string>{"H!B6 dimensioned-argument", "H!B6 dimensioned-argument"});
}

TEST_CASE("workbook parity: the Magnus fit solved for the dew point, its constants typed") {
    // t_d = b·ln(p_w/c)/(a - ln(p_w/c)) with a = 17.625, b = 243.04 °C and c = 6.1094 hPa
    // (Alduchov and Eskridge 1996, from memory): the sheet cannot give 6.1094 a unit, so a
    // cell over a number inside LN is read as over a reference value in the cell's unit, and
    // the result is a reading on the °C scale, each with a note. A vapour pressure under LN
    // with no number, and the fit into a cell in K, stay findings.
    const check_report r = check_one_sheet(
        "D", sheet_of({
                 {"12.4", "hPa"},                                        // B2
                 {"=243.04*LN(B2/6.1094)/(17.625-LN(B2/6.1094))", "°C"}, // B3
                 {"=243.04*LN(B2)/(17.625-LN(B2))", "°C"},               // B4: no reference
                 {"=243.04*LN(B2/6.1094)/(17.625-LN(B2/6.1094))", "K"},  // B5: not °C
                 {"=0.61094*EXP(17.625*B3/(B3+243.04))", "kPa"},         // B6
             }));
    CHECK(cell_findings(r) ==
          std::vector<std::string>{
              "D!B3 trade-constant", "D!B3 trade-constant", "D!B3 trade-constant",
              "D!B4 dimensioned-argument", "D!B4 dimensioned-argument", "D!B5 result-unit",
              "D!B5 trade-constant", "D!B5 trade-constant", "D!B6 trade-constant"});
}

TEST_CASE("workbook parity: a formula of numbers alone is in the unit written beside it") {
    // A motor size picked from the standard ratings, =IF(B2<=55,55,75) beside kW (IEC 60072-1
    // frame ratings, from memory): the numbers carry no unit and are in the cell's, as a typed
    // input is, and the cell then feeds others in that unit. A cell reference in its value
    // keeps it checked (=IF(B2<=55,B2,75) is in B2's unit). The sheet's XML escapes the <.
    const check_report r = check_one_sheet("S", sheet_of({
                                                    {"48", "kW"},                   // B2
                                                    {"=IF(B2&lt;=55,55,75)", "kW"}, // B3
                                                    {"=55", "kW"},                  // B4
                                                    {"=B3*1000", "W"},              // B5: right
                                                    {"=B3*1000", "kW"}, // B6: not needed
                                                    {"=IF(B2&lt;=55,B2,75)", "kN"}, // B7: wrong
                                                }));
    const auto found = cell_findings(r);
    CHECK(found == std::vector<std::string>{"S!B6 unit-scale", "S!B7 result-unit"});
}

TEST_CASE("workbook parity: Manning's full-pipe 0.463 in US units") {
    // Q = 0.463/n·D^(8/3)·S^(1/2) in cfs with D in ft (common practice): 1.486 ft^(1/3)/s
    // (3.2808^(1/3), NIST SP 811 (2008), B.8) times a full circle's π/4·4^(-2/3) = 0.3117.
    // With the diameter in inches the 12^(8/3) is missing.
    const check_report r = check_one_sheet("S", sheet_of({
                                                    {"0.013", "s/m^(1/3)"},               // B2
                                                    {"2.5", "ft"},                        // B3
                                                    {"30", "in"},                         // B4
                                                    {"0.004", "ft/ft"},                   // B5
                                                    {"=0.463/B2*B3^(8/3)*B5^0.5", "cfs"}, // B6
                                                    {"=0.463/B2*B4^(8/3)*B5^0.5", "cfs"}, // B7
                                                }));
    CHECK(cell_findings(r) == std::vector<std::string>{"S!B6 trade-constant", "S!B7 unit-scale"});
}

TEST_CASE("workbook parity: Hazen-Williams' constant restated for the cell's units") {
    // h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) in m from m³/s and m, and the fire trade's
    // 4.52·Q^1.85/(C^1.85·D^4.87) in psi/ft from gpm and inches (NFPA 13, from memory): each
    // restates to 10.67 for a head, or 10.67 times water's specific weight for a pressure.
    // Typed bare they read as a fit's constant, and an input in another unit (the bore in mm,
    // the flow in L/s) lands far from it: the cell is wrong, whatever the fit.
    const check_report r =
        check_one_sheet("S", sheet_of({
                                 {"120", "m"},                                   // B2 pipe length
                                 {"0.02", "m3/s"},                               // B3
                                 {"20", "L/s"},                                  // B4
                                 {"130", "-"},                                   // B5 C factor
                                 {"0.15", "m"},                                  // B6 bore
                                 {"150", "mm"},                                  // B7 bore
                                 {"300", "gpm"},                                 // B8
                                 {"6.065", "in"},                                // B9
                                 {"=10.67*B2*B3^1.852/(B5^1.852*B6^4.87)", "m"}, // B10: right
                                 {"=10.67*B2*B4^1.852/(B5^1.852*B7^4.87)", "m"}, // B11: L/s and mm
                                 {"=4.52*B8^1.85/(B5^1.85*B9^4.87)", "psi/ft"},  // B12: right
                                 {"=4.52*B8^1.85/(B5^1.85*B7^4.87)", "psi/ft"},  // B13: mm
                             }));
    const auto found = cell_findings(r);
    CHECK(std::count(found.begin(), found.end(), "S!B10 trade-constant") == 1);
    CHECK(std::count(found.begin(), found.end(), "S!B12 trade-constant") == 1);
    const auto flagged = [&](const std::string& cell) {
        return std::any_of(found.begin(), found.end(), [&](const std::string& f) {
            return f.rfind(cell + " ", 0) == 0 && f.find("trade-constant") == std::string::npos;
        });
    };
    CHECK_FALSE(flagged("S!B10"));
    CHECK_FALSE(flagged("S!B12"));
    CHECK(flagged("S!B11"));
    CHECK(flagged("S!B13"));
}

namespace {

// A sheet of (label, value or formula, unit text) rows from row 2 on: label in A, value in B,
// unit in C.
std::string
labelled_sheet(std::initializer_list<std::tuple<std::string, std::string, std::string>> rows) {
    std::string xml = "<worksheet><sheetData>";
    int r = 2;
    for (const auto& [label, value, unit] : rows) {
        std::string row = value_and_unit_row(r, value, unit);
        const std::string n = std::to_string(r++);
        row.insert(row.find('>') + 1,
                   "<c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label + "</t></is></c>");
        xml += row;
    }
    return xml + "</sheetData></worksheet>";
}

} // namespace

TEST_CASE("workbook parity: a specific gravity on the wrong side of water's 0.433") {
    // p = 0.433·SG·h psi from ft of a liquid (common practice; γ_w = 62.4 lb/ft³ over 144
    // in²/ft²): the SG multiplies, as in the notation, where 0.433*h/SG is off by SG squared.
    // The cell's label says it holds a specific gravity.
    const check_report r =
        check_one_sheet("Pump", labelled_sheet({
                                    {"Slurry specific gravity", "1.15", "-"},       // B2
                                    {"Static head", "120", "ft"},                   // B3
                                    {"Discharge pressure", "=0.433*B2*B3", "psig"}, // B4: right
                                    {"Discharge pressure", "=0.433*B3/B2", "psig"}, // B5: slip
                                }));
    const diagnostic* sg = nullptr;
    for (const auto& d : r.diagnostics)
        if (const cell_place* c =
                d.where.file != nullptr ? d.where.file->cell_at(d.where.range.begin) : nullptr)
            if (cell_text(*c) == "Pump!B5" && d.rule == rules::gravity_number &&
                d.level == severity::warning)
                sg = &d;
    REQUIRE(sg != nullptr);
    CHECK(says(*sg, "is a specific gravity"));
    CHECK(problems_in(r) == 1);
}

TEST_CASE("workbook parity: the unit written for a cell says which term of a sum is off") {
    // A heat leak in W/m times a length beside a pump's kW, in a kW cell: the W term is off by
    // 1000 (SI Brochure 9th ed., Table 7: kilo = 10³), not the kW one.
    const check_report r = check_one_sheet("Tank", sheet_of({
                                                       {"25", "W/m"},            // B2
                                                       {"180", "m"},             // B3
                                                       {"45", "kW"},             // B4
                                                       {"=B2*B3+B4", "kW"},      // B5: slip
                                                       {"=B2*B3/1000+B4", "kW"}, // B6: right
                                                   }));
    const diagnostic* d = finding(r, "Tank!B5", rules::unit_scale);
    REQUIRE(d != nullptr);
    bool divide = false;
    for (const auto& n : d->notes)
        divide = divide || n.message.find("divide 'B2*B3' by 1000") != std::string::npos;
    CHECK(divide);
    CHECK(problems_in(r) == 1);
}

TEST_CASE("workbook parity: a formula that gives a word needs no unit") {
    // A lining picked from a list by name ("Grass, short (mown)", Chow, Open-Channel
    // Hydraulics, 1959, Table 5-6, from memory) stands above the verdicts, and its brackets
    // hold no unit: a cell whose every value is text is not asked for one. A cell that can
    // give a number under it still is.
    std::string xml = "<worksheet><sheetData>"
                      "<row r=\"2\"><c r=\"B2\" t=\"inlineStr\"><is><t>Grass, short (mown)</t>"
                      "</is></c></row>";
    xml += value_and_unit_row(3, "0.8", "-");
    xml += "<row r=\"4\"><c r=\"B4\"><f>IF(B3&lt;1,\"subcritical\",\"SUPERCRITICAL\")</f>"
           "<v>0</v></c></row>"
           "<row r=\"5\"><c r=\"B5\"><f>IF(B3&lt;1,\"OK\",B3)</f><v>0</v></c></row>"
           "</sheetData></worksheet>";
    const check_report r = check_one_sheet("Channel", xml);
    CHECK(finding(r, "Channel!B4", rules::no_unit) == nullptr);
    CHECK(finding(r, "Channel!B5", rules::no_unit) != nullptr);
}

TEST_CASE("workbook parity: an apparent power written under a real power's unit") {
    // Real power is the apparent power times the power factor, P = S·pf (IEC 80000-6, from
    // memory): a kVA cell copied into a kW cell leaves the power factor out, as the notation's
    // P = S does. Times a power factor cell it passes.
    const check_report r = check_one_sheet("MCC", labelled_sheet({
                                                      {"Apparent power", "250", "kVA"}, // B2
                                                      {"Power factor", "0.85", "-"},    // B3
                                                      {"Real power", "=B2", "kW"},      // B4
                                                      {"Real power", "=B2*B3", "kW"},   // B5
                                                  }));
    const diagnostic* d = finding(r, "MCC!B4", rules::unit_scale);
    REQUIRE(d != nullptr);
    CHECK(says(*d, "apparent power"));
    CHECK(problems_in(r) == 1);
}

TEST_CASE("workbook parity: a rim speed without π and a torque without 2π, read from cells") {
    // v = π·D·n (common practice) and M = 60 000·P/(2π·n) in N·m from kW and rpm (9549·P/n):
    // a workbook's cells declare their units only beside them, so the rules that need a speed
    // in revolutions read the cells' units, and a length's row label or heading for its
    // diameter. A row named for a pulley ("Drive") says nothing of what its cell measures.
    const auto row = [](int r, const std::string& label, const std::string& value,
                        const std::string& unit) {
        const std::string n = std::to_string(r);
        return "<row r=\"" + n + "\"><c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label +
               "</t></is></c>" + value_and_unit_row(r, value, unit).substr(9 + n.size());
    };
    const std::string xml =
        "<worksheet><sheetData>" + row(2, "Pulley diameter", "800", "mm") +
        row(3, "Pulley speed", "40", "rpm") + row(4, "Belt speed", "=PI()*B2/1000*B3/60", "m/s") +
        row(5, "Belt speed, slip", "=B2/1000*B3/60", "m/s") + row(6, "Drive power", "75", "kW") +
        row(7, "Torque", "=9549*B6/B3", "N·m") + row(8, "Torque, slip", "=B6*60000/B3", "N·m") +
        row(9, "Screw pitch", "0.5", "m") + row(10, "Screw travel", "=B9*B3/60", "m/s") +
        "</sheetData></worksheet>";
    const check_report r = check_one_sheet("S", xml);
    // 9549 = 60 000/(2π) gets its note, as in the notation.
    CHECK(cell_findings(r) ==
          std::vector<std::string>{"S!B5 unit-scale", "S!B7 trade-constant", "S!B8 unit-scale"});
    const diagnostic* rim = finding(r, "S!B5", rules::unit_scale);
    REQUIRE(rim != nullptr);
    CHECK(says(*rim, "off by 3.14159"));
    CHECK(says(*rim, "multiply by PI()"));
}

namespace {

// A row with its label in A, its value or formula in B and its unit in C.
std::string labelled_row(int r, const std::string& label, const std::string& value,
                         const std::string& unit) {
    const std::string n = std::to_string(r);
    std::string row = value_and_unit_row(r, value, unit);
    const std::string cell_a =
        "<c r=\"A" + n + "\" t=\"inlineStr\"><is><t>" + label + "</t></is></c>";
    return row.insert(row.find('>') + 1, cell_a);
}

} // namespace

TEST_CASE("workbook parity: a moist-air enthalpy cell counts its °C reading from 0 °C") {
    // h = 1.006·t + W·(2501 + 1.86·t) in kJ/kg dry air with t in °C (ASHRAE Handbook,
    // Fundamentals (2017), ch. 1, eq. 32, from memory): the psychrometric tables count dry air's
    // enthalpy from 0 °C, so t is the rise above that datum where the row names an enthalpy,
    // as an enthalpy symbol's side is in a .plumb file. Without the label it stays an error.
    const auto sheet = [](const std::string& label) {
        return "<worksheet><sheetData>" + labelled_row(2, "Outdoor air", "30", "°C") +
               labelled_row(3, "Humidity ratio", "12", "g/kg") +
               labelled_row(4, "c_p of dry air", "1.006", "kJ/(kg*K)") +
               labelled_row(5, "c_p of water vapour", "1.86", "kJ/(kg*K)") +
               labelled_row(6, "Latent heat at 0 °C", "2501", "kJ/kg") +
               labelled_row(7, label, "=B4*B2+B3/1000*(B6+B5*B2)", "kJ/kg") +
               "</sheetData></worksheet>";
    };
    const check_report named = check_one_sheet("AHU", sheet("Outdoor air enthalpy"));
    CHECK(problems_in(named) == 0);
    CHECK(cell_findings(named) ==
          std::vector<std::string>{"AHU!B7 trade-constant", "AHU!B7 trade-constant"});
    const check_report unnamed = check_one_sheet("AHU", sheet("Outdoor air heat"));
    CHECK(count_of(unnamed, rules::offset_scale) >= 1);
}

TEST_CASE("workbook parity: a conversion factor turned over is named, whatever scales beside it") {
    // 1 MWh = 3.6 GJ (SI Brochure 9th ed., Table 8): =B2/(B3/100)/3.6 divides by the factor
    // it must multiply by, and the value shown is 3.6² = 12.96 times too small; the % over
    // 100 beside it is no part of the factor named.
    const check_report r = check_one_sheet("Fuel", sheet_of({
                                                       {"120", "MWh"},             // B2
                                                       {"85", "%"},                // B3
                                                       {"=B2/(B3/100)/3.6", "GJ"}, // B4
                                                       {"=B2/(B3/100)*3.6", "GJ"}, // B5: right
                                                   }));
    CHECK(cell_findings(r) == std::vector<std::string>{"Fuel!B4 unit-scale"});
    REQUIRE(!r.diagnostics.empty());
    CHECK(says(r.diagnostics.front(), "the conversion factor 3.6 in this formula is the wrong way "
                                      "round: to give GJ it must multiply by it"));
    CHECK(says(r.diagnostics.front(), "12.96 times too small"));
}

TEST_CASE("workbook parity: a row that types the site's barometer is the declared barometer") {
    // 1 atm = 14.696 psi (NIST SP 811 (2008), B.8); a site at about 730 m reads some 13.46 psia
    // (the standard atmosphere, from memory). psig + 14.7 there is 1.24 psi high, as a .plumb
    // file with the barometer declared is told; + the barometer's cell passes.
    const auto sheet = [](const std::string& label) {
        return "<worksheet><sheetData>" + labelled_row(2, "Pump discharge", "38", "psig") +
               labelled_row(3, label, "13.46", "psia") +
               labelled_row(4, "Discharge, absolute", "=B2+14.7", "psia") +
               labelled_row(5, "Discharge, absolute (site)", "=B2+B3", "psia") +
               "</sheetData></worksheet>";
    };
    const check_report site = check_one_sheet("Plant", sheet("Site barometric pressure"));
    CHECK(cell_findings(site) == std::vector<std::string>{"Plant!B4 offset-scale"});
    REQUIRE(!site.diagnostics.empty());
    CHECK(says(site.diagnostics.front(), "declares the site's barometer 'B3'"));
    // A row that is no barometer (a vessel's pressure) declares none.
    CHECK(cell_findings(check_one_sheet("Plant", sheet("Vessel pressure"))).empty());
}

TEST_CASE("workbook parity: a gas pressure in inches of water column beside gauge units") {
    // 1 inH2O = 249.08891 Pa, 1 mbar = 100 Pa (NIST SP 811 (2008), B.8): 20 mbar(g) × 0.4015 is
    // 8.03 inches of water column, the gauge reading a gas supply is given in (common
    // practice). The inch of water keeps the atmosphere's zero there, and mbar(g) and the
    // gauge inch share it: a factor turned over is named as such, not the scales' zeros.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Supply pressure", "20", "mbar(g)") +
        labelled_row(3, "Supply pressure, US", "=B2*0.4015", "in. w.c.") +
        labelled_row(4, "Supply pressure, US (turned)", "=B2*2.491", "in. w.c.") +
        labelled_row(5, "Meter outlet", "7", "in. w.c.") +
        labelled_row(6, "Meter outlet, metric", "=B5*2.491", "mbar(g)") +
        labelled_row(7, "Supply pressure, gauge inch", "=B2*2.491", "in. w.c. (g)") +
        "</sheetData></worksheet>";
    const check_report r = check_one_sheet("Gas", sheet);
    CHECK(cell_findings(r) == std::vector<std::string>{"Gas!B4 unit-scale", "Gas!B7 unit-scale"});
    for (const auto& d : r.diagnostics)
        CHECK_FALSE(says(d, "zeros"));
}

TEST_CASE("workbook parity: a share by mass, the gallon in a longer unit, and cfh") {
    // A coagulant at 48.5 % w/w (common practice) is a fraction once over 100; a dose over it
    // without the 100 is 100 times small. 1 ft³/h = 0.028316846592/3600 m³/s (NIST SP 811
    // (2008), B.8): m³/h × 35.31 is cfh.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Alum dose", "30", "kg/h") +
        labelled_row(3, "Alum strength", "48.5", "% w/w") +
        labelled_row(4, "Solution feed", "=B2/(B3/100)", "kg/h") +
        labelled_row(5, "Solution feed (planted)", "=B2/B3", "kg/h") +
        labelled_row(6, "Gas flow", "12", "m³/h") +
        labelled_row(7, "Gas flow, US", "=B6*35.31", "cfh") +
        labelled_row(8, "Recovery", "=B6*264.2", "US gal/h") + "</sheetData></worksheet>";
    CHECK(cell_findings(check_one_sheet("Dosing", sheet)) ==
          std::vector<std::string>{"Dosing!B5 unit-scale"});
}

TEST_CASE("workbook parity: a drop across regulators computed from bar a and bar(g)") {
    // An absolute reading less a gauge one is the atmosphere (1 atm = 1.01325 bar, NIST SP 811
    // (2008), B.8), not the drop between two pressures the row names; the drop from two
    // readings on one scale passes.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Tank pressure", "11.2", "bar a") +
        labelled_row(3, "Line pressure", "9.5", "bar(g)") +
        labelled_row(4, "Tank pressure, gauge", "10.2", "bar(g)") +
        labelled_row(5, "Pressure drop across the regulators", "=B2-B3", "bar") +
        labelled_row(6, "Pressure drop across the regulators", "=B4-B3", "bar") +
        "</sheetData></worksheet>";
    CHECK(cell_findings(check_one_sheet("VIE", sheet)) ==
          std::vector<std::string>{"VIE!B5 offset-scale"});
}

TEST_CASE("workbook parity: a hydrostatic pressure in psig less a formation pressure in psia") {
    // Overbalance = hydrostatic pressure − formation pressure, both gauge or both absolute; the
    // mud column's 0.052·MW·TVD in psig is a gauge reading at its foot (common practice; 1 atm =
    // 14.696 psi, NIST SP 811 (2008), B.8). Less a psia reading it is 14.7 psi short; with the
    // rig floor's atmosphere added it is right. In kPa, an absolute unit, the column is ρ·g·h,
    // a difference, and less an absolute reading gives the absolute pressure above it.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Hydrostatic pressure at TVD", "5290", "psig") +
        labelled_row(3, "Formation pressure, wireline test (absolute)", "5120", "psia") +
        labelled_row(4, "Atmosphere at the rig floor", "14.7", "psia") +
        labelled_row(5, "Overbalance on the formation", "=B2-B3", "psi") +
        labelled_row(6, "Overbalance on the formation", "=B2+B4-B3", "psi") +
        labelled_row(7, "Hydrostatic pressure of the column", "36.5", "kPa") +
        labelled_row(8, "Pressure at the top of the column", "=B3*6.895-B7", "kPa") +
        "</sheetData></worksheet>";
    CHECK(cell_findings(check_one_sheet("Pit", sheet)) ==
          std::vector<std::string>{"Pit!B5 offset-scale"});
}

TEST_CASE("workbook parity: a duct's velocity pressure and friction rate in inches of water") {
    // p_v = (V/4005)² in in. w.g. from fpm for standard air (ASHRAE Fundamentals, duct design,
    // from memory); a friction rate in in. w.g. per 100 ft times a length in ft needs the 100.
    // A fan's hp = cfm × in. w.g./(6356 × η) with η a fraction (common practice): with η in %
    // the value is 100 times small, which is what is said.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Duct velocity", "1500", "fpm") +
        labelled_row(3, "Velocity pressure", "=(B2/4005)^2", "in. w.g.") +
        labelled_row(4, "Friction rate", "0.15", "in. w.g./100 ft") +
        labelled_row(5, "Duct length", "80", "ft") +
        labelled_row(6, "Friction loss", "=B4*B5/100", "in. w.g.") +
        labelled_row(7, "Friction loss (planted)", "=B4*B5", "in. w.g.") +
        labelled_row(8, "Exhaust", "4000", "cfm") + labelled_row(9, "Fan efficiency", "60", "%") +
        labelled_row(10, "Fan power", "=B8*B6/(6356*B9/100)", "hp") +
        labelled_row(11, "Fan power (planted)", "=B8*B6/(6356*B9)", "hp") +
        "</sheetData></worksheet>";
    const check_report r = check_one_sheet("Hood", sheet);
    CHECK(cell_findings(r) == std::vector<std::string>{"Hood!B11 unit-scale",
                                                       "Hood!B3 trade-constant",
                                                       "Hood!B7 unit-scale"});
    for (const auto& d : r.diagnostics)
        if (d.rule == plumb::rules::unit_scale && says(d, "hp")) {
            CHECK(says(d, "100 times too small"));
            CHECK_FALSE(says(d, "coefficient"));
        }
}

TEST_CASE("workbook parity: a flow at 0 °C times a heating value per volume at 15 °C") {
    // 1 Nm³ (0 °C) = 1.0549 Sm³ (15 °C), both at 101.325 kPa (ISO 13443, from memory): a
    // meter's normal flow times a heating value per standard volume is 5.2 % low, as a
    // symbol's declared units already said; the same states, or the ratio written, pass.
    const std::string sheet =
        "<worksheet><sheetData>" + labelled_row(2, "Flow, normal", "1800", "Nm³/h") +
        labelled_row(3, "Flow, standard", "1899", "Sm³/h") +
        labelled_row(4, "Heating value", "39.2", "MJ/Sm³") +
        labelled_row(5, "Energy a day", "=B2*24*B4/1000", "GJ/d") +
        labelled_row(6, "Energy a day", "=B3*24*B4/1000", "GJ/d") +
        labelled_row(7, "Energy a day", "=B2*288.15/273.15*24*B4/1000", "GJ/d") +
        "</sheetData></worksheet>";
    CHECK(cell_findings(check_one_sheet("Gas", sheet)) ==
          std::vector<std::string>{"Gas!B5 unit-scale"});
}

TEST_CASE("workbook parity: a gauge cell plus the site's barometer typed into an absolute cell") {
    // Absolute = gauge + the local atmosphere (common practice); 99.8 kPa and 1.0 bar are the
    // standard atmosphere's about 130 m and 110 m up (its barometric formula, from memory). The
    // notation reads "p_a = p_g + 99.8" so; a cell whose unit is absolute is read the same way.
    // A number no atmosphere has stays the offset-scale error, and so does NPSH with it.
    const check_report r =
        check_one_sheet("Baro", sheet_of({
                                    {"22", "kPa(g)"},                         // B2
                                    {"=B2+99.8", "kPa"},                      // B3: right
                                    {"8", "bar(g)"},                          // B4
                                    {"=B4+1.0", "bar a"},                     // B5: right
                                    {"=B2+20", "kPa"},                        // B6: no atmosphere
                                    {"1.4", "kPa"},                           // B7: vapour pressure
                                    {"999.5", "kg/m³"},                       // B8
                                    {"=(B2+99.8-B7)*1000/(B8*9.80665)", "m"}, // B9: right, NPSHa
                                    {"=(B2+20-B7)*1000/(B8*9.80665)", "m"},   // B10: no atmosphere
                                }));
    CHECK_FALSE(error_at(r, "Baro!B3"));
    CHECK_FALSE(error_at(r, "Baro!B5"));
    CHECK_FALSE(error_at(r, "Baro!B9"));
    const diagnostic* note = finding(r, "Baro!B3", rules::trade_constant);
    REQUIRE(note != nullptr);
    CHECK(says(*note, "99.8 is read as the atmospheric pressure where the gauge is"));
    CHECK(finding(r, "Baro!B6", rules::offset_scale) != nullptr);
    CHECK(finding(r, "Baro!B10", rules::offset_scale) != nullptr);
}

TEST_CASE("workbook parity: a g left out of a cell's formula is said outright") {
    // P = ρ·g·Q·H (common practice) and a line load w = m·g (g_n = 9.80665 m/s², SI Brochure
    // 9th ed., Table 8, standard acceleration of gravity); without g the cell computes a
    // momentum rate or a linear density, which names no slip. With g it passes; a g too many
    // is asked the other way.
    const check_report r =
        check_one_sheet("G", sheet_of({
                                 {"998", "kg/m³"},                 // B2
                                 {"0.05", "m³/s"},                 // B3
                                 {"30", "m"},                      // B4
                                 {"=B2*B3*B4/1000", "kW"},         // B5: g left out
                                 {"=B2*9.80665*B3*B4/1000", "kW"}, // B6: right
                                 {"25", "kg/m"},                   // B7
                                 {"=B7/1000", "kN/m"},             // B8: g left out
                                 {"9.80665", "m/s²"},              // B9: g
                                 {"=B2*B9*B9*B4/1000", "kPa"},     // B10: a g too many
                             }));
    for (const char* cell : {"G!B5", "G!B8"}) {
        const diagnostic* d = finding(r, cell, rules::result_unit);
        REQUIRE_MESSAGE(d != nullptr, cell);
        CHECK(says(*d, "times g it would match; is a g missing"));
    }
    CHECK_FALSE(error_at(r, "G!B6"));
    const diagnostic* twice = finding(r, "G!B10", rules::result_unit);
    REQUIRE(twice != nullptr);
    CHECK(says(*twice, "divided by g it would match"));
}
