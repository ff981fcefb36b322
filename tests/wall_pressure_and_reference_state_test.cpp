// Gauge pressures scaled by the shape of a wall (Barlow, thin shells, p_g/SG), numbers that
// stand for a standard reference temperature or pressure in a gas correction (V*273.15/T), and
// a column's pressure written with its number first in a sum (0.433*h + p_top): the correct
// forms pass, and the gas-law and missing-weight slips beside them are still errors.
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <initializer_list>
#include <string>

namespace {

using plumb::test::count_of;
using plumb::test::first_under;
using plumb::test::problems_in;
constexpr auto run = plumb::test::check_after;
constexpr auto fails_with = plumb::test::each_fails_with;

void passes(const std::string& declarations, std::initializer_list<const char*> formulas,
            std::size_t notes = 0) {
    for (const char* formula : formulas) {
        CAPTURE(formula);
        const auto r = run(declarations, formula);
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::trade_constant) +
                  count_of(r, plumb::rules::gravity_number) ==
              notes);
    }
}

const std::string pipeline = "p_g, p_2g, P_d : psig\np_a, p_2a : psia\nS, σ : psi\nD, t, R : in\n"
                             "A_1, A_2 : in^2\nV_1, V_2 : ft^3\nT_1, T_2 : °R\nE, SG : 1\n"
                             "ρ_1, ρ_2 : lb/ft^3\nh : ft\n";

} // namespace

TEST_CASE("a gauge pressure scaled by the shape of a wall is a net pressure") {
    // Barlow's formula σ = p·D/(2t) and its inverse P = 2·S·t/D take the internal gauge
    // pressure, the difference across the wall (common practice; the design pressure of ASME
    // B31.8, 841.1.1, is a gauge pressure, from memory); so does the thin-shell thickness
    // t = P·R/(S·E − 0.6·P) (ASME BPVC VIII-1, UG-27, from memory), and a Lamé thick-wall
    // stress with diameters squared (common practice).
    passes(pipeline, {"@barlow σ = p_g*D/(2*t)", "@barlow-inverse P_d = 2*S*t/D",
                      "@barlow-joint P_d = 2*S*t/D*E", "@shell t = P_d*R/(S*E - 0.6*P_d)",
                      "@lame σ = p_g*(D^2 + t^2)/(D^2 - t^2)", "@intensifier p_2g = p_g*A_1/A_2"});
    // 2.31 ft of water per psi, divided by the specific gravity (common practice).
    passes(pipeline, {"@head h = 2.31*p_g/SG"}, 1);
    // The hoop tension per unit length of a pipe or tank wall, T = p·D/2 (thin-wall ring,
    // common practice; the tank designer's T = γ·H·D/2 per unit height, from memory).
    passes(pipeline + "T_r : lbf/in\n", {"@ring T_r = p_g*D/2", "@ring-radius T_r = p_g*R"});
}

TEST_CASE("a gauge pressure times a volume, or a volume over a length, is no wall load") {
    // p·V is a gas's energy (needs absolute pressure), and p·V/D has the dimension of a line
    // load but is no wall's: both stay errors.
    fails_with(pipeline + "W : ft*lbf\nT_r : lbf/in\n",
               {"@work W = p_g*V_1", "@volume-over-length T_r = p_g*V_1/D^2"},
               plumb::rules::offset_scale);
}

TEST_CASE("a gauge pressure over an elastic modulus or a strength is a ratio of stresses") {
    // A pipe prover's correction for the pressure's effect on its steel, CPS = 1 + P·ID/(E·WT),
    // takes P in psig (API MPMS ch. 12.2, from memory); a hydrotest's added volume ΔV = V·p/K
    // takes the test's gauge reading over water's bulk modulus (common practice); and a line's
    // hoop stress as a share of its yield, P·D/(2·t·SMYS), the internal gauge pressure (ASME
    // B31.8, 841.1.1, from memory).
    const std::string prover = "P_p : psig\np_a : psia\nID, WT : in\nID_mm : mm\n"
                               "E_s : psi \"modulus of elasticity of the prover steel\"\n"
                               "K_w : psi \"bulk modulus of water\"\nσ_y : psi\n"
                               "S : psi \"SMYS of the line pipe\"\nF : 1\np_b : psia\n"
                               "V_p, ΔV : ft^3\nCPS : 1\n";
    passes(prover, {"@cps CPS = 1 + P_p*ID/(E_s*WT)", "@hydrotest-volume ΔV = V_p*P_p/K_w",
                    "@hoop-share F = P_p*ID/(2*WT*S)", "@hoop-over-yield F = P_p*ID/(2*σ_y*WT)"});
    // The metric diameter beside it is still 25.4 off, and a gauge reading over an absolute
    // pressure (the barometer too), or over two strengths, is still a pressure ratio.
    const auto metric = run(prover, "@cps-mm CPS = 1 + P_p*ID_mm/(E_s*WT)");
    CHECK(count_of(metric, plumb::rules::unit_scale) == 1);
    CHECK(count_of(metric, plumb::rules::offset_scale) == 0);
    fails_with(prover,
               {"@ratio-to-absolute CPS = 1 + P_p/p_a", "@ratio-to-barometer F = P_p*ID/(WT*p_b)",
                "@over-two F = P_p*ID/(WT*S*σ_y)*{psi}"},
               plumb::rules::offset_scale);
}

TEST_CASE("a gauge pressure in a gas law or a pressure ratio is still an error") {
    // Boyle's and Charles's laws and compression ratios need absolute pressure (common
    // practice), with the ratio inside or outside parentheses and before or after the gauge.
    fails_with(pipeline,
               {"@boyle p_2g = p_g*V_1/V_2", "@boyle-paren p_2g = p_g*(V_1/V_2)",
                "@boyle-first p_2g = V_1/V_2*p_g", "@charles p_2g = p_g*(T_2/T_1)",
                "@density p_2g = p_g*ρ_2/ρ_1", "@ratio E = p_2g/p_g"},
               plumb::rules::offset_scale);
    // An absolute pressure, bare, scaled by a number or by a volume ratio, set equal to a gauge.
    fails_with(pipeline,
               {"@gauge-is-absolute p_g = p_a", "@gauge-is-scaled-absolute p_g = 0.9*p_a",
                "@boyle-into-gauge p_2g = p_a*V_1/V_2"},
               plumb::rules::offset_scale);
    const auto r = run(pipeline, "@boyle p_2g = p_g*V_1/V_2");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    const std::string& message = first_under(r, plumb::rules::offset_scale).message;
    CHECK(message.find("'p_g'") != std::string::npos);
    CHECK(message.find("cannot be multiplied") != std::string::npos);
}

namespace {
const std::string gas = "V_n, V : m^3\nT : K\np : kPa\nq_s, q_a : ft^3/min\np_f : psia\n"
                        "p_fg : psig\nT_R : °R\nt_f : °F\nt_c : °C\nQ : W\nm : kg/s\n"
                        "c_p : J/(kg*K)\n";
} // namespace

TEST_CASE("a number in ratio with an absolute reading is read as a standard reference state") {
    // Normal volume at 0 °C = 273.15 K (SI Brochure 9th ed., 2.3.1) and 101.325 kPa (the
    // standard atmosphere, 10th CGPM 1954); the US gas trade's 14.73 psia and 60 °F =
    // 519.67 °R, or 14.7 and 520 rounded (common practice; °R = °F + 459.67, NIST SP 811
    // (2008), 4.2.1.1).
    passes(gas, {"@normal V_n = V*273.15/T", "@normal-first V_n = 273.15*V/T"}, 1);
    passes(gas,
           {"@normal-both V_n = V*(p/101.325)*(273.15/T)",
            "@standard q_s = q_a*(p_f/14.73)*(519.67/T_R)",
            "@standard-rounded q_s = q_a*(p_f/14.7)*(520/T_R)",
            "@standard-fahrenheit q_s = q_a*(p_f/14.73)*(520/(t_f + 459.67))",
            "@normal-celsius V_n = V*(p/101.325)*(273.15/(t_c + 273.15))"},
           2);
    // Q = Q_n·(T/T_n)·(p_n/p) (DIN 1343's normal state, from memory) with the normal
    // temperature declared and the pressure's typed: three readings in one product.
    passes(gas + "T_n : K = 273.15 \"normal temperature\"\n",
           {"@actual V = V_n*T/T_n*101.325/p", "@actual-grouped V = V_n*(T/T_n)*(101.325/p)"}, 1);
    const auto r = run(gas, "@normal V_n = V*273.15/T");
    REQUIRE(count_of(r, plumb::rules::trade_constant) == 1);
    const plumb::diagnostic& note = first_under(r, plumb::rules::trade_constant);
    CHECK(note.message.find("'273.15' is read as a standard reference temperature") !=
          std::string::npos);
    CHECK(note.level == plumb::severity::note);
}

TEST_CASE("the atmosphere added to an absolute reading converted by a factor") {
    // psia = kPa/6.895 (NIST SP 811 (2008), B.8, rounded) for an absolute reading: adding 14.7
    // counts the atmosphere twice, as p_kPa + 101.325 would; a column plus 14.7 is absolute.
    const std::string blower = "p_2 : kPa \"discharge, absolute\"\np_x : psia\nh_f : ft\n";
    CHECK(problems_in(run(blower, "p_x = p_2/6.895 + 14.7")) == 1);
    passes(blower, {"p_x = p_2/6.895"});
    passes(blower, {"p_x = 0.433*h_f + 14.7"}, 2);
    // 14.5 psi per bar and 100 kPa per bar (NIST SP 811 (2008), B.8): the same slip, named by
    // its zero; a gauge reading converted so takes the atmosphere rightly.
    const std::string boiler = "p_abs : bar \"boiler pressure, absolute\"\np_g : barg\n"
                               "p_psia : psia\np_kabs : kPa\n";
    fails_with(
        boiler,
        {"p_psia = 14.5*p_abs + 14.7", "p_kabs = 100*p_abs + 101.3", "p_psia = p_abs*14.5 + 14.7"},
        plumb::rules::offset_scale);
    const auto twice = run(boiler, "p_psia = 14.5*p_abs + 14.7");
    CHECK(plumb::test::says(first_under(twice, plumb::rules::offset_scale),
                            "counts that zero twice"));
    passes(boiler, {"p_psia = 14.5*p_g + 14.7", "p_kabs = 100*p_g + 101.3"});
}

TEST_CASE("a barometer in mbar over 1000 added to a bar g reading is a conversion") {
    // p_abs = p_g + p_b/1000 in bar with the barometer in mbar (EN 12405-1's volume conversion,
    // from memory; 1 bar = 1000 mbar, SI Brochure 9th ed., Table 8): the 1000 converts, and is
    // no reference pressure of 1000 mbar.
    const std::string meter = "p_g : barg\np_b : mbar \"site barometer\"\np_a : bar\n";
    passes(meter, {"p_a = p_g + p_b/1000", "p_a = p_g + 0.001*p_b"});
    fails_with(meter, {"p_a = p_g + p_b"}, plumb::rules::unit_scale);
}

TEST_CASE("a reference number beside no absolute reading, or the wrong one, is not read") {
    // 273.15 multiplying a heat capacity stands in ratio with no temperature reading.
    fails_with(gas, {"@heat-with-273 Q = m*c_p*273.15"}, plumb::rules::side_mismatch);
    // 460 °R is the offset between the scales, not a reference temperature (255.4 K).
    fails_with(gas, {"@rankine-offset q_s = q_a*(p_f/14.7)*(460/T_R)"},
               plumb::rules::side_mismatch);
    // A reading on the °C or °F scale or a gauge pressure in the ratio: absolute ones needed.
    fails_with(gas,
               {"@celsius V_n = V*273.15/t_c", "@fahrenheit q_s = q_a*(p_f/14.73)*(520/t_f)",
                "@gauge q_s = q_a*(p_fg/14.73)*(520/T_R)"},
               plumb::rules::offset_scale);
    // Multiplied where it should divide: the ratio then has a dimension.
    fails_with(gas, {"@upside V_n = V*(p*101.325)*(273.15/T)"}, plumb::rules::side_mismatch);
}

namespace {
const std::string receiver = "V_r, V_f, V_1, V_2 : L\np_1, p_2 : kPa\np_1g, p_2g : kPag\n"
                             "Δp : kPa\nt_fill : s\nQ_f : L/s\nh : m\np_1p, p_2p : psia\n"
                             "T_1, T_2 : K\nt_1, t_2 : °C\nρ : kg/m^3\nR : J/(kg*K)\n";
} // namespace

TEST_CASE("a reference pressure or temperature in ratio with a difference is read too") {
    // Free air delivered while a receiver is pumped from p_1 to p_2: V_r*(p_2 - p_1)/p_atm
    // (Boyle's law at constant temperature, from memory of compressor handbooks' receiver
    // sizing); the difference is the same in gauge and absolute readings. A gas's expansion
    // from 0 °C: ΔV = V_1*ΔT/273.15 (Charles's law, SI Brochure 9th ed., 2.3.1 for 273.15 K).
    passes(receiver,
           {"@free-air V_f = V_r*(p_2 - p_1)/101.325",
            "@free-air-gauge V_f = V_r*(p_2g - p_1g)/101.325",
            "@free-air-declared V_f = V_r*Δp/101.325",
            "@free-air-rate Q_f = V_r*(p_2 - p_1)/(101.325*t_fill)",
            "@free-air-psi V_f = V_r*(p_2p - p_1p)/14.7", "@charles V_2 = V_1*(T_2 - T_1)/273.15",
            "@charles-celsius V_2 = V_1*(t_2 - t_1)/273.15"},
           1);
    // Both reference numbers in one product beside a unit conversion: three numbers to read.
    passes(receiver + "V_n : m^3\n",
           {"@normal-free-air V_n = V_r/1000*(p_2 - p_1)/101.325*273.15/T_2"}, 2);
}

TEST_CASE("a reference number beside a difference stays an error where it does not divide it") {
    // Multiplied, or in the other unit's atmosphere, or with a gauge reading in place of a
    // difference (the gas law needs absolute pressure), or giving a length.
    fails_with(receiver,
               {"@upside V_f = V_r*(p_2 - p_1)*101.325", "@wrong-unit V_f = V_r*(p_2 - p_1)/14.7",
                "@wrong-unit-psi V_f = V_r*(p_2p - p_1p)/101.325", "@head h = (p_2 - p_1)/101.325",
                "@rate-upside Q_f = V_r*(p_2 - p_1)/101.325*t_fill",
                "@nested-upside V_f = V_r*(p_2 - p_1)/(V_r/101.325)*V_r",
                "@density ρ = (p_2 - p_1)/(R*273.15)"},
               plumb::rules::side_mismatch);
    fails_with(receiver, {"@gauge-reading V_f = V_r*p_2g/101.325"}, plumb::rules::offset_scale);
}

namespace {
const std::string column = "p_t, p_b : psig\nh, z : ft\np_k, p_kt : kPag\nh_m : m\n";
} // namespace

TEST_CASE("a column's pressure written with its number is read in either order of a sum") {
    // p = p_top + γ_w·Δz with water's 0.433 psi/ft and 9.81 kN/m³ (common practice).
    passes(column,
           {"@column p_b = p_t + 0.433*h", "@column-first p_b = 0.433*h + p_t",
            "@column-si p_k = 9.81*h_m + p_kt"},
           1);
    passes(column, {"@two-legs p_b = 0.433*h + 0.433*z + p_t"}, 2);
    fails_with(column, {"@no-weight p_b = h + p_t", "@head-and-column p_b = 0.433*h + z + p_t"},
               plumb::rules::sum_mismatch);
    fails_with(column, {"@upside p_b = h/0.433 + p_t"}, plumb::rules::unit_scale);
}

namespace {
const std::string depth = "p_k : kPa\np_kg : kPag\np_a : psia\np_ag : psig\nρ : kg/m^3\n"
                          "g : m/s^2\nh_m : m\nh_f : ft\n";
} // namespace

TEST_CASE("a column's pressure plus the atmosphere written as a number is absolute") {
    // p_abs = p_atm + ρ·g·h, with the standard atmosphere 101.325 kPa (10th CGPM, 1954) or
    // 14.7 psi, or 1 bar = 100 kPa, and water's 9.81 kN/m³ and 0.433 psi/ft (common practice).
    passes(depth, {"@si p_k = ρ*g*h_m/1000 + 101.325", "@bar p_k = ρ*g*h_m/1000 + 100"}, 1);
    passes(depth,
           {"@metric p_k = 9.81*h_m + 101.325", "@metric-first p_k = 101.325 + 9.81*h_m",
            "@us p_a = 0.433*h_f + 14.7"},
           2);
    const auto r = run(depth, "@metric p_k = 9.81*h_m + 101.325");
    CHECK(first_under(r, plumb::rules::trade_constant)
              .message.find("'101.325' is read as the "
                            "atmospheric pressure") != std::string::npos);
}

TEST_CASE("the atmosphere added to a gauge reading, in the wrong unit or without a column") {
    // A gauge reading does not include the atmosphere (common practice).
    fails_with(depth, {"@gauge p_kg = 9.81*h_m + 101.325", "@gauge-us p_ag = 0.433*h_f + 14.7"},
               plumb::rules::offset_scale);
    fails_with(depth,
               {"@pascals-beside-kilopascals p_k = ρ*g*h_m + 101.325",
                "@feet-in-metric p_k = 9.81*h_f + 101.325",
                "@kilopascals-in-psi p_a = 0.433*h_f + 101.325",
                "@missing-weight p_k = h_m + 101.325", "@psi-in-kilopascals p_k = 9.81*h_m + 14.7",
                "@subtracted p_a = 0.433*h_f - 14.7"},
               plumb::rules::sum_mismatch);
    // A failed reading leaves no note behind.
    const auto r = run(depth, "@missing-weight p_k = h_m + 101.325");
    CHECK(count_of(r, plumb::rules::trade_constant) == 0);
    CHECK(count_of(r, plumb::rules::gravity_number) == 0);
}

TEST_CASE("NPSH from a gauge reading: the atmosphere added in the converted unit") {
    // NPSH_a = (p_s,abs − p_v)/(ρ·g) with the suction gauge reading plus the atmosphere,
    // 101 325 Pa (standard atmosphere, 10th CGPM 1954) or 14.7 psi (common practice).
    const std::string npsh = "NPSH : m\nN_ft : ft\np_k : kPag\np_vk : kPa\np_s : psig\n"
                             "p_v : psia\nSG : 1\nρ : kg/m^3\ng : m/s^2\nT_m : K\n"
                             "t_1, t_2 : °C\n";
    passes(npsh, {"@pascals NPSH = (p_k*1000 + 101325 - p_vk*1000)/(ρ*g)",
                  "@kilopascals NPSH = (p_k + 101.325 - p_vk)*1000/(ρ*g)",
                  "@mean T_m = 0.5*t_1 + 0.5*t_2 + 273.15"});
    passes(npsh, {"@us N_ft = 2.31*(p_s + 14.7 - p_v)/SG"}, 1);
    fails_with(npsh,
               {"@no-atmosphere NPSH = (p_k - p_vk)*1000/(ρ*g)",
                "@no-atmosphere-us N_ft = 2.31*(p_s - p_v)/SG"},
               plumb::rules::offset_scale);
    // The atmosphere in kPa beside terms converted to Pa: flagged.
    CHECK(problems_in(run(npsh, "@kilopascal-atmosphere NPSH = (p_k*1000 + 101.325 - "
                                "p_vk*1000)/(ρ*g)")) >= 1);
}

// Fan shaft power P = V̇·Δp/η (common practice), with V̇ in m³/h, Δp in mbar (100 Pa) and P
// in kW: 100/(3600*1000) converts, and 1000 is no reference pressure of 1000 mbar, since the
// product already has the power the other side has. Free air from a receiver, V_r·Δp/p_n,
// still reads its 101.325.
TEST_CASE("a side that has the other side's dimension holds no reference state") {
    const std::string fan = "V_a : m^3/h\nΔp_mbar : mbar\nη_f : 1\nP_f : kW\nV_r, V_fad : m^3\n"
                            "p_1, p_2 : kPa\n";
    passes(fan, {"P_f = 100*V_a*Δp_mbar/(3600*1000*η_f)"});
    passes(fan, {"V_fad = V_r*(p_2 - p_1)/101.325"}, 1);
    fails_with(fan, {"P_f = V_a*Δp_mbar/(3600*1000*η_f)"}, plumb::rules::unit_scale);
}

// A pipeline's pressure-drop budget as a share of its nominal gauge pressure, Δp = 0.05·p
// (common practice for medical gas distribution, from memory): a gauge pressure is the rise
// above the atmosphere, and a share of it set equal to a quantity declared a difference is a
// difference. Set equal to an absolute pressure it stays an error.
TEST_CASE("a share of a gauge pressure set equal to a difference") {
    const std::string gases = "p_O2, p_lo : kPag\nΔp_max : kPa\np_abs : kPa\n";
    passes(gases, {"Δp_max = 0.05*p_O2", "Δp_max = p_O2/20", "p_lo = 0.8*p_O2"});
    fails_with(gases, {"p_abs = 0.05*p_O2", "p_abs = 0.8*p_O2"}, plumb::rules::offset_scale);
}

// A blower's discharge gauge reads the liquid over its diffusers plus the losses in the pipes
// and diffusers (Metcalf & Eddy, Wastewater Engineering, aeration blowers, from memory); a
// drop to an outlet open to the air is what the gauge before it reads (common practice). A
// pressure declared as a difference or a loss is read so; a plain absolute reading is not.
TEST_CASE("a gauge reading set equal to declared drops and a column's pressure") {
    const std::string blower = "p_dg : kPag\nh_w : m\nρ_w : kg/m^3\nΔp_d : kPa\n"
                               "h_L : kPa \"diffuser and pipe losses\"\np_d : kPa\n"
                               "σ_w : kPa \"wall stress\"\n";
    passes(blower, {"p_dg = Δp_d", "Δp_d = p_dg", "p_dg = h_L", "p_dg = ρ_w*{g_n}*h_w/1000 + Δp_d",
                    "p_dg = Δp_d + ρ_w*{g_n}*h_w/1000 + h_L", "p_dg = (Δp_d)"});
    fails_with(blower,
               {"p_dg = p_d", "p_dg = ρ_w*{g_n}*h_w/1000 + p_d", "p_dg = p_d - ρ_w*{g_n}*h_w/1000"},
               plumb::rules::offset_scale);
}

// A tunnel lining's grout pressure, read on a gauge, held below the overburden stress at the
// crown, σ_v = γ·C (soil stresses count from the atmosphere: zero at the ground surface; Craig's
// Soil Mechanics, from memory): a stress is no absolute reading. In bar(g) against kPa the
// comparison is off by the 100, which is what is said.
TEST_CASE("a gauge reading compared with a stress in soil") {
    const std::string lining = "p_gr : kPag\np_gb : barg\nσ_v : kPa \"overburden stress\"\n"
                               "p_abs : kPa\nγ_s : kN/m^3\nC : m\n";
    passes(lining, {"p_gr <= σ_v", "σ_v = γ_s*C", "p_gr <= γ_s*C"});
    fails_with(lining, {"p_gb <= σ_v"}, plumb::rules::unit_scale);
    fails_with(lining, {"p_gr <= p_abs"}, plumb::rules::offset_scale);
}

// A normal cubic metre is gas at 0 °C and 101.325 kPa (DIN 1343, from memory), a standard one
// at 15 °C (ISO 13443, from memory): an actual volume becomes one only times (p/p_n)·(T_n/T)
// (the ideal gas law). Set equal to it directly, or with time conversions alone, the actual
// volume is a warning; a correction, or a ratio such as LNG's 600, is not questioned.
TEST_CASE("an actual gas volume set equal to one at reference conditions") {
    const std::string gas = "Q_n : Nm3/h\nQ_act, Q_2 : m^3/h\nQ_s : m^3/s\nV_s : Sm³\nV : m^3\n"
                            "p_1, p_n : kPa\nT_n, T_g : K\n";
    passes(gas, {"Q_n = Q_act*(p_1/p_n)*(T_n/T_g)", "Q_act = Q_2", "V_s = 600*V"});
    fails_with(gas, {"Q_n = Q_act", "Q_n = Q_s*3600", "V_s = V"}, plumb::rules::unit_scale);
}

// The hydrostatic test pressure P_T = 1.3·MAWP·S_amb/S (ASME BPVC VIII-1 UG-99(b), from
// memory): a gauge pressure times a ratio of allowable stresses stays a gauge reading, as
// 1.3*MAWP does; the stresses in two units are 6.895 apart (NIST SP 811 (2008), B.8). The
// average pressure of a gas line, 2/3·(p_1 + p_2 - p_1·p_2/(p_1 + p_2)), integrates p² and
// needs absolute pressures (common practice): gauge readings multiplied together are an error.
TEST_CASE("a gauge pressure times a ratio of stresses, and gauge pressures multiplied") {
    const std::string vessel =
        "MAWP, P_T, p_1g, p_2g, p_avg_g : psig\nS, S_amb : MPa \"allowable stress\"\n"
        "S_ksi : ksi \"allowable stress, US data sheet\"\np_1, p_2, p_avg : psia\n";
    passes(vessel, {"P_T = 1.3*MAWP*S_amb/S", "P_T = 1.5*MAWP*S_amb/S",
                    "p_avg = 2/3*(p_1 + p_2 - p_1*p_2/(p_1 + p_2))"});
    fails_with(vessel, {"P_T = 1.3*MAWP*S_ksi/S"}, plumb::rules::unit_scale);
    fails_with(vessel,
               {"p_avg_g = 2/3*(p_1g + p_2g - p_1g*p_2g/(p_1g + p_2g))",
                "p_avg_g = p_1g*p_2g/(p_1g + p_2g)", "P_T = 1.3*MAWP*p_1g/p_2g"},
               plumb::rules::offset_scale);
}

// A psig reading converted to kPa or bar by its number (6.895 kPa and 0.06895 bar per psi,
// NIST SP 811 (2008), B.8) and set equal to an absolute pressure: the advice adds the
// atmosphere in the unit the expression gives (101.325 kPa, 1.01325 bar), not in psi.
TEST_CASE("the atmosphere advised in the unit a converted gauge reading is in") {
    const std::string decl = "p_1g : psig\np_1kPa : kPa\np_bar : bar\n";
    const auto kpa = run(decl, "p_1kPa = 6.895*p_1g");
    CHECK(plumb::test::says(first_under(kpa, plumb::rules::offset_scale),
                            "(6.895*p_1g + 101.325) at sea level, the standard atmosphere in kPa"));
    const auto bar = run(decl, "p_bar = 0.06895*p_1g");
    CHECK(plumb::test::says(first_under(bar, plumb::rules::offset_scale), "+ 1.01325)"));
    passes(decl, {"p_1kPa = 6.895*p_1g + 101.325", "p_bar = 0.06895*p_1g + 1.01325"});
}

// A gauge reading plus the site's barometer: 92.1 kPa at 800 m in the standard atmosphere
// (ISO 2533, the barometric formula, from memory), and "bar a = bar g + 1" with the
// atmosphere rounded to 1 bar (common practice): notes. A number no atmosphere reaches, or
// none, stays an error.
TEST_CASE("a gauge reading plus the local atmosphere typed as a number") {
    const std::string decl = "p_max : kPag\np_abs : kPa\np_bg : barg\np_ba : bar\n";
    passes(decl, {"p_abs = p_max + 92.1", "p_ba = p_bg + 1"}, 1);
    // 62.9 kPa, a heap leach pad at 3850 m (the standard atmosphere, from memory): the highest
    // sites plants stand on, to about 5200 m (52.7 kPa), are read too.
    passes(decl, {"p_abs = p_max + 62.9"}, 1);
    const auto high = run(decl, "p_abs = p_max + 62.9");
    CHECK(plumb::test::says(first_under(high, plumb::rules::trade_constant), "about 3840 m"));
    fails_with(decl, {"p_abs = p_max + 20", "p_abs = p_max", "p_abs = p_max + 45"},
               plumb::rules::offset_scale);
}

// The sea-level atmosphere (101.325 kPa = 14.696 psi = 1.01325 bar, ISO 2533, from memory)
// added to a gauge reading in a file that declares the site's barometer at 96.2 kPa, which
// the standard atmosphere has about 440 m up (the barometric formula, from memory): the
// absolute pressure is 5 kPa high, a warning that names the barometer. The barometer itself,
// its value typed in, and a file whose declared atmosphere is the standard one, pass.
TEST_CASE("the sea-level atmosphere where the file declares the site's barometer") {
    const std::string site = "p_b : kPa \"site barometric pressure, 96.2 kPa\"\n"
                             "p_g : kPag\np_abs : kPa\np_gpsi : psig\np_apsi : psia\n";
    fails_with(site, {"p_abs = p_g + 101.325", "p_apsi = p_gpsi + 14.7"},
               plumb::rules::offset_scale);
    const auto r = run(site, "p_abs = p_g + 101.325");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "declares the site's barometer 'p_b' (96.2 kPa"));
    passes(site, {"p_abs = p_g + p_b"});
    passes(site, {"p_abs = p_g + 96.2"}, 1);
    // In a psi sum the barometer declared in kPa is given in psi (96.2 kPa is 13.9526 psi,
    // 1 psi = 6.894757 kPa, NIST SP 811 (2008), B.8): its name alone would add kPa to psi.
    const auto psi = run(site, "p_apsi = p_gpsi + 14.7");
    CHECK(plumb::test::says(first_under(psi, plumb::rules::offset_scale),
                            "write (... + 13.9526), 'p_b' in the sum's unit"));
    // A sum in psi through a rounded factor (27.7 in. w.c. per psi, NIST SP 811 (2008), B.8
    // gives 27.68) names the barometer declared in psi itself.
    const auto rounded = run("p_b : psi \"site barometric pressure, 12.1 psi\"\n"
                             "p_w : inH2Og\np_a : psia\n",
                             "p_a = 14.696 + p_w/27.7");
    CHECK(plumb::test::says(first_under(rounded, plumb::rules::offset_scale), "write (... + p_b)"));
    // Set equal to a gauge reading, the atmosphere added is the one slip, reported once.
    const auto onto_gauge = run(site, "p_gpsi = p_g/6.895 + 14.7");
    CHECK(problems_in(onto_gauge) == 1);
    CHECK(plumb::test::says(first_under(onto_gauge, plumb::rules::offset_scale), "drop the 14.7"));
    // A site at 3850 m (62.9 kPa, the standard atmosphere, from memory) is held to its
    // barometer too: the sea level's there is 38 kPa high.
    const std::string andes = "p_b : kPa = 62.9 \"site barometer\"\np_g : kPag\np_abs : kPa\n";
    fails_with(andes, {"p_abs = p_g + 101.325"}, plumb::rules::offset_scale);
    passes(andes, {"p_abs = p_g + p_b"});
    // A pressure "below atmosphere" is no barometer, and a declared sea-level atmosphere means
    // the file's sums with 101.325 are right.
    passes("p_atm : kPa \"atmospheric pressure, 101.3 kPa\"\n"
           "p_vac : kPa \"suction vacuum gauge, 62 kPa below atmosphere\"\n"
           "p_g : kPag\np_abs : kPa\n",
           {"p_abs = p_g + 101.325"});
    // Declared by its value after `=`, in psia: 13.2 psia is 91.0 kPa.
    fails_with("p_atm : psia = 13.2\np_gpsi : psig\np_apsi : psia\n", {"p_apsi = p_gpsi + 14.7"},
               plumb::rules::offset_scale);
    passes("p_atm : kPa = 101.325\np_g : kPag\np_abs : kPa\n", {"p_abs = p_g + 101.325"});
    passes("p_b : kPa \"barometric pressure\"\np_g : kPag\np_abs : kPa\n",
           {"p_abs = p_g + 101.325"});
}

// A deaerator's NPSH calc declares its site's barometer at 0.995 bar, which the standard
// atmosphere has about 150 m up (the barometric formula, from memory), then makes a gauge
// reading absolute with the sea level's 1.01325 bar: 1.8 kPa high, 0.18 m of NPSH. That
// passed without a word while the slack was 2 %. A barometer 1.1 % from the sea level's (29.6
// inHg, 100.24 kPa; NIST SP 811 (2008), B.8: 1 inHg = 3386.389 Pa) is within what the
// weather moves it, and a motive steam line made absolute with 101.325 passes.
TEST_CASE("the sea-level atmosphere 1.8 % above the site's declared barometer") {
    const std::string deaerator = "p_b : bar \"site barometric pressure, 0.995 bar\"\n"
                                  "p_da : barg\np_daA : bar\n";
    fails_with(deaerator, {"p_daA = p_da + 1.01325"}, plumb::rules::offset_scale);
    const auto r = run(deaerator, "p_daA = p_da + 1.01325");
    // Said in the sum's unit, bar: 1.8 kPa is 0.018 bar.
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "0.018 bar high"));
    passes(deaerator, {"p_daA = p_da + p_b"});
    passes("p_baro : inHg \"local barometer, 29.6 inHg\"\np_msg : barg\np_msk : kPa\n",
           {"p_msk = 100*p_msg + 101.325"});
}

// The sea-level atmosphere taken off an absolute piezometer, h = (p_pz - 101.325)/γ_w, and an
// NPSH from an open sump, (101.325 - p_v)/(ρ·g), where the file declares the site's barometer
// at 100.4 kPa and 97.8 kPa (about 80 m and 300 m up, the barometric formula, from memory):
// the difference carries the whole error, 0.09 m and 0.36 m of head. Both passed without a
// word; the warning names the barometer. The site's barometer in its place passes, and so
// does a gauge reading made absolute with 101.325 at a site 0.5 % below it, a small share of
// a larger pressure.
TEST_CASE("the sea-level atmosphere beside absolute readings where the file declares the site's") {
    const std::string piezometer = "p_pz : kPa \"piezometer reading, absolute\"\n"
                                   "p_b : kPa = 100.4 \"site barometric pressure\"\n"
                                   "γ_w : kN/m^3\nh_pz : m\n";
    fails_with(piezometer, {"h_pz = (p_pz - 101.325)/γ_w"}, plumb::rules::offset_scale);
    passes(piezometer, {"h_pz = (p_pz - p_b)/γ_w"});
    const std::string sump = "p_b : kPa = 97.8 \"site barometric pressure\"\np_v : kPa\n"
                             "ρ : kg/m^3\nNPSH : m\n";
    const auto r = run(sump, "NPSH = (101.325 - p_v)*1000/(ρ*{g_n})");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "write p_b in place of 101.325"));
    passes(sump, {"NPSH = (p_b - p_v)*1000/(ρ*{g_n})"});
    passes("p_b : kPa \"site barometer, 100.8 kPa\"\np_g : kPag\np_a : kPa\n",
           {"p_a = p_g + 101.325"});
    // A barometer described in psia beside a unit declared psi (14.3 psia is 98.6 kPa).
    fails_with("p_b : psi \"site barometric pressure, 14.3 psia\"\np_g : psig\np_a : psia\n",
               {"p_a = p_g + 14.696"}, plumb::rules::offset_scale);
}

// An accumulator's precharge at 0.9 of the lowest working pressure, a ratio of absolute
// pressures from Boyle's law (bladder makers' sizing notes, from memory), written on a bar g
// reading and set equal to an absolute precharge: the advice offers the atmosphere inside the
// product, beside the relief valve's form (1.1 × p_set + the atmosphere, API 520, from
// memory), which the advice's first half gives. A 1.1 gets no such note.
TEST_CASE("a ratio times a gauge reading is told where the atmosphere goes for each reading") {
    const std::string d = "p_1 : barg\np_0a : bar\n";
    const auto r = run(d, "p_0a = 0.9*p_1");
    const plumb::diagnostic& f = first_under(r, plumb::rules::offset_scale);
    CHECK(plumb::test::says(f, "(0.9*p_1 + 1.01325) at sea level"));
    CHECK(plumb::test::says(f, "write 0.9*(p_1 + the atmospheric pressure) instead"));
    const auto relief = run(d, "p_0a = 1.1*p_1");
    CHECK(!plumb::test::says(first_under(relief, plumb::rules::offset_scale), "instead"));
}

// An embankment's excess pore pressure, u_e = u - γ_w·h_w (Craig's Soil Mechanics, 8th ed.,
// ch. 7, from memory), from a kPag piezometer and the hydrostatic column: plumb takes γ_w·h_w
// for a difference, so the sum stays a gauge reading beside a kPa symbol, still an error. The
// finding said "the number added" where none is; it now says how the column was taken, and
// declaring the hydrostatic pressure as a gauge reading passes.
TEST_CASE("a gauge reading less a column's pressure is told how the column was taken") {
    const std::string d = "u_g, u_0 : kPag\nγ_w : kN/m^3\nh_w : m\nu_e : kPa\n";
    const auto r = run(d, "u_e = u_g - γ_w*h_w");
    const plumb::diagnostic& f = first_under(r, plumb::rules::offset_scale);
    CHECK(plumb::test::says(f, "'γ_w*h_w' is taken as a pressure difference"));
    CHECK(!plumb::test::says(f, "the number added"));
    passes(d, {"u_0 = γ_w*h_w", "u_e = u_g - u_0"});
}

// A bearing's setting temperature for a US supplier written 1.8*(t + 273.15), which is degrees
// Rankine (1 °R = 5/9 K, NIST SP 811 (2008), B.9), set equal to a °F reading: still an
// error, and the other side is named on the Rankine scale, not the kelvin's.
TEST_CASE("kelvins times 1.8 are named degrees Rankine") {
    const std::string d = "t_set : °C\nt_setF : °F\n";
    const auto r = run(d, "t_setF = 1.8*(t_set + 273.15)");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "is on the absolute scale (°R)"));
    passes(d, {"t_setF = 1.8*t_set + 32"});
}

// 14.73 psia, the US gas contract's base pressure (AGA Report No. 3's base conditions, 14.73
// psia and 60 °F, from memory), is 101.56 kPa: added to a gauge reading at a site whose
// barometer the file declares at 28.6 inHg (96.85 kPa, NIST SP 811 (2008), B.8: 1 inHg =
// 3386.389 Pa), it takes the contract's base for the site's atmosphere, 4.7 kPa high. The
// advice names the barometer declared in the sum's unit.
TEST_CASE("an atmosphere typed as a number that is not the site's declared barometer") {
    const std::string meter = "p_bar : inHg \"site barometric pressure, 28.6 inHg\"\n"
                              "p_g : psig\np_f : psia\np_b : psia \"site barometer, psia\"\n";
    fails_with(meter, {"p_f = p_g + 14.73"}, plumb::rules::offset_scale);
    const auto r = run(meter, "p_f = p_g + 14.73");
    const plumb::diagnostic& d = first_under(r, plumb::rules::offset_scale);
    // The barometer named is the one declared in the sum's unit, psi, as the advice's is.
    CHECK(plumb::test::says(d, "14.73 is an atmosphere of 101.56 kPa, but this file declares "
                               "the site's barometer 'p_b'"));
    // Said in the sum's unit, psi: 4.7 kPa is 0.68 psi.
    CHECK(plumb::test::says(d, "0.68 psi high"));
    CHECK(plumb::test::says(d, "write (... + p_b)"));
    // The site's own barometer typed in (28.6 inHg is 14.05 psi) is read with a note.
    passes(meter, {"p_f = p_g + 14.05"}, 1);
    passes(meter, {"p_f = p_g + p_b"});
}

// A scrubber at a site whose barometer the file declares at 13.5 psia (about 700 m in the
// standard atmosphere, from memory): a gauge reading in barg set equal to an absolute one is
// told to add that barometer in bar, 13.5 × 0.0689476 = 0.930792 (NIST SP 811 (2008), B.8:
// 1 psi = 6894.757 Pa), not the sea level's 1.01325. A deaerator's 100*p_da, in kPa from barg,
// beside an absolute vapour pressure is told the site's 0.995 bar as 99.5 kPa.
TEST_CASE("a gauge reading's advice names the site's declared barometer in the reading's unit") {
    const std::string scrubber = "p_b : psia = 13.5 \"site barometric pressure\"\n"
                                 "p_a : psia\np_barg : barg\n";
    const auto r = run(scrubber, "p_barg = p_a/14.504");
    const plumb::diagnostic& d = first_under(r, plumb::rules::offset_scale);
    CHECK(plumb::test::says(d, "write (p_barg + 0.930792), 'p_b' in bar"));
    CHECK(!plumb::test::says(d, "1.01325"));
    const std::string deaerator = "p_b : bar \"site barometric pressure, 0.995 bar\"\n"
                                  "p_da : barg\np_v : kPa\nΔp : kPa\n";
    const auto n = run(deaerator, "Δp = 100*p_da - p_v");
    CHECK(plumb::test::says(first_under(n, plumb::rules::offset_scale),
                            "write (100*p_da + 99.5), 'p_b' in kPa"));
    passes(deaerator, {"Δp = 100*(p_da + p_b) - p_v"});
}

// A blower's pressure ratio takes absolute pressures (common practice): at a site whose
// barometer the file declares, the advice beside a gauge reading in the ratio names it, in the
// reading's unit, not the sea level's atmosphere.
TEST_CASE("a gauge reading in a pressure ratio is told to add the site's declared barometer") {
    const std::string blower = "p_bar : kPa \"site barometric pressure, 97.7 kPa\"\n"
                               "p_1 : kPa\np_2g : kPag\np_2s : psig\nr : 1\n";
    const auto r = run(blower, "r = p_2g/p_1");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "write (p_2g + p_bar)"));
    const auto s = run(blower, "r = p_2s/p_1");
    CHECK(plumb::test::says(first_under(s, plumb::rules::offset_scale),
                            "write (p_2s + 14.1702), 'p_bar' in psi"));
    const auto u = run("p_1 : kPa\np_2g : kPag\nr : 1\n", "r = p_2g/p_1");
    CHECK(plumb::test::says(first_under(u, plumb::rules::offset_scale),
                            "add the atmospheric pressure"));
}

// A head of water above a point is the pressure above the atmosphere there over ρ·g (common
// practice): from a non-vented piezometer, which reads absolute, the barometer comes off
// first, or the head is some 10 m of water too high. NPSH's (p_abs - p_v)/(ρ·g) and a water
// barometer's own column are no such slip.
TEST_CASE("a head from an absolute pressure alone is told to take the barometer off") {
    const std::string piezometer = "p_pz : kPa \"piezometer reading, absolute\"\n"
                                   "p_b : kPa \"site barometric pressure, 99.6 kPa\"\n"
                                   "p_v : kPa \"vapour pressure, absolute\"\n"
                                   "γ_w : kN/m^3\nρ_w : kg/m^3\nh_pz, NPSH, h_b : m\n";
    const auto r = run(piezometer, "h_pz = p_pz/γ_w");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "write (p_pz - p_b)"));
    fails_with(piezometer, {"h_pz = p_pz*1000/(ρ_w*{g_n})"}, plumb::rules::offset_scale);
    passes(piezometer, {"h_pz = (p_pz - p_b)/γ_w", "NPSH = (p_pz - p_v)/γ_w", "h_b = p_b/γ_w"});
}

// The same absolute reading as one term of the energy's sum, a turbine's net head H = p/(ρ·g) +
// V²/(2·g) (IEC 60041, from memory), or times the feet of water per psi, 2.31 (1 psi = 6894.76
// Pa, NIST SP 811 (2008), B.8; ρ_w·g_n = 9.79 kN/m³ at 15 °C, common practice): the head is
// still some 10 m of water high. A gauge reading there, a difference of absolute readings, and
// a sum with no pressure in it pass.
TEST_CASE("a head from an absolute pressure among the energy's terms or times 2.31") {
    const std::string d = "p_a : bar \"turbine inlet, absolute transducer\"\np_g : bar(g)\n"
                          "p_v : bar \"vapour pressure, absolute\"\nρ : kg/m^3\nV : m/s\n"
                          "H, z : m\np_psia : psia \"unvented transducer, absolute\"\nH_ft : ft\n";
    fails_with(d,
               {"H = 1e5*p_a/(ρ*{g_n}) + V^2/(2*{g_n})",
                "H = z + 1e5*p_a/(ρ*{g_n}) + V^2/(2*{g_n})", "H_ft = 2.31*p_psia"},
               plumb::rules::offset_scale);
    passes(d, {"H = 1e5*p_g/(ρ*{g_n}) + V^2/(2*{g_n})",
               "H = 1e5*(p_a - p_v)/(ρ*{g_n}) + V^2/(2*{g_n})", "H = z + V^2/(2*{g_n})"});
}

// A pore water pressure counts from the atmosphere, as a vented piezometer reads it (Terzaghi's
// σ' = σ - u; common practice): an unvented transducer's absolute reading, converted from psia
// (1 psi = 6.894757 kPa, NIST SP 811 (2008), B.8), or a vented one with the barometer added,
// set equal to it is an atmosphere high; so is the pressure across a drum's hole taken as its
// absolute reading. The absolute reading less the barometer, and the vented reading alone, pass;
// a vacuum with the barometer added is told to negate the gauge reading instead.
TEST_CASE("a pressure counted from the atmosphere set equal to an absolute one") {
    const std::string d = "u : kPa \"pore water pressure at the tip\"\n"
                          "p_A : psia \"unvented transducer, absolute\"\n"
                          "p_V : psig \"vented transducer\"\n"
                          "p_b : kPa \"site barometric pressure\"\n"
                          "Δp : bar \"pressure difference across the hole\"\n"
                          "p_da : bar \"drum pressure, absolute\"\np_dg : bar(g)\n"
                          "p_vac : kPa \"vacuum under the membrane, counted below the barometer\"\n"
                          "p_mg : kPag \"membrane dial gauge\"\n";
    fails_with(d, {"u = 6.895*p_A", "u = 6.895*p_V + p_b", "Δp = p_da"},
               plumb::rules::offset_scale);
    const auto r = run(d, "u = 6.895*p_A");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "take the barometer off: write (6.895*p_A - p_b)"));
    const auto v = run(d, "p_vac = p_b + p_mg");
    REQUIRE(count_of(v, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::says(first_under(v, plumb::rules::offset_scale), "write -(p_mg)"));
    passes(d, {"u = 6.895*p_A - p_b", "u = 6.895*p_V", "Δp = p_dg", "Δp = p_da - p_b/100"});
}

// The barometer a file declares at sea level (a ship's, 1.013 bar) is still the one to add to
// a gauge reading, in the reading's unit (1 bar = 100 kPa, NIST SP 811 (2008), B.8).
TEST_CASE("a gauge reading's advice names the declared barometer in another unit") {
    const std::string ship = "p_b : bar \"ship's barometric pressure, 1.013 bar\"\n"
                             "p_ev_g : kPag\np_sat : kPa\np_s : barg\np_v : bar\nΔp : bar\n";
    const auto r = run(ship, "p_ev_g <= p_sat");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "(p_ev_g + p_b*100)"));
    const auto n = run(ship, "Δp = p_s - p_v");
    CHECK(plumb::test::says(first_under(n, plumb::rules::offset_scale), "write (p_s + p_b)"));
}

// A gauge reading plus the barometer is absolute (common practice); the atmosphere added
// again as a number counts it twice, 101 kPa high. This passed without a word.
TEST_CASE("a gauge reading plus the barometer and the atmosphere again") {
    const std::string decl = "p_g : psig\np_b : psia \"barometer\"\np_f : psia\n"
                             "p_gk : kPag\np_atm : kPa \"atmospheric pressure\"\np_k : kPa\n";
    fails_with(decl, {"p_f = p_g + p_b + 14.7", "p_k = p_gk + p_atm + 101.325"},
               plumb::rules::offset_scale);
    const auto r = run(decl, "p_f = p_g + p_b + 14.7");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "both add the atmosphere"));
    passes(decl, {"p_f = p_g + p_b", "p_k = p_gk + p_atm"});
}

// Free air in cfm into Nm³/min by the volume factor alone (1 m³ = 35.3147 ft³, NIST SP 811
// (2008), B.8): still no correction for the air's state, a warning as Q_n = Q_act is.
TEST_CASE("a concentration at reference conditions times a flow described at its actual state") {
    // E = c·Q with c per normal m³ needs Q in normal m³ (DIN 1343's normal state, from memory);
    // a stack's actual flow at 185 °C is some 1.7 times the normal one.
    const std::string stack = "C_mg : mg/Nm3\nE : kg/h\n"
                              "Q_act : m3/h \"wet flue gas at stack temperature and pressure\"\n"
                              "Q_n : Nm3/h\n";
    fails_with(stack, {"E = C_mg*Q_act/1e6"}, plumb::rules::unit_scale);
    passes(stack, {"E = C_mg*Q_n/1e6"});
}

TEST_CASE("gas volumes at two reference states in a ratio") {
    // 1 Nm³ (0 °C) = 1.0549 Sm³ (15 °C) at 101.325 kPa (ISO 13443, from memory): a fill time
    // from a volume in Sm³ over a capacity in Nm³/h is 5.5 % short.
    const std::string cng = "V_u : Sm3\nQ_cn : Nm3/h\nQ_cs : Sm3/h\nt_fill : min\n";
    fails_with(cng, {"t_fill = V_u/Q_cn*60"}, plumb::rules::unit_scale);
    passes(cng, {"t_fill = V_u/Q_cs*60", "t_fill = V_u/(1.0549*Q_cn)*60"});
}

TEST_CASE("a gas's velocity from a flow at reference conditions") {
    // v = Q/A with Q the actual volume flow (common practice); Q_n in Nm³/h (0 °C, 101.325 kPa,
    // DIN 1343) is some 2.3 times smaller than the actual flow of a 350 °C off-gas.
    const std::string duct = "Q_n : Nm3/h\nQ_a : m^3/h\nA_d : m^2\nD : m\nV_d : m/s\n"
                             "T : K\nT_n : K = 273.15\np_n, p : kPa\n";
    fails_with(duct + "D_mm : mm\n",
               {"V_d = Q_n/(3600*A_d)", "V_d = 4*Q_n/(3600*pi*D^2)",
                "V_d = Q_n/(3600*pi/4*(D_mm/1000)^2)"},
               plumb::rules::unit_scale);
    passes(duct, {"V_d = Q_a/(3600*A_d)", "V_d = Q_n*T/T_n/(3600*A_d)",
                  "V_d = Q_n*(p_n/p)*(T/T_n)/(3600*A_d)", "V_d = 4*Q_a/(3600*pi*D^2)"});
    // A fan's speed in rpm or a supply's frequency in Hz declared beside them, as a fan or
    // baghouse calc does, once hid the finding (the rotation rules took the velocity first).
    fails_with(duct + "n_f : rpm \"fan speed\"\nf : Hz\n", {"V_d = Q_n/(3600*A_d)"},
               plumb::rules::unit_scale);
}

// The trades fold the conversions into one number: v = 353.7·Q/D² in m/s from m³/h and mm
// (4/π × 10⁶/3600, common practice), a fan's bhp = Q·Δp/(6356·η) from cfm and in. w.g.
// (AMCA 201, from memory), a filter's cloth area A = Q/(air-to-cloth ratio) (EPA Air
// Pollution Control Cost Manual, 6th ed., 5.1, from memory). Each wants the actual flow; a
// flow at reference conditions there is the same slip as in Q/A, though a note reads the
// number.
TEST_CASE("a flow at reference conditions in formulas with the trade's folded numbers") {
    const std::string decl = "Q_n : Nm3/h\nQ_a : m^3/h\nv : m/s\nD_mm : mm\nQ_s : scfm\n"
                             "Q_ac : acfm\nΔp : inH2O\nη : 1\nP_bhp : hp\nA_cl : ft^2\n"
                             "AC : fpm\nT : K\n";
    fails_with(decl,
               {"v = 353.7*Q_n/D_mm^2", "v = 4e6*Q_n/(3600*pi*D_mm^2)", "P_bhp = Q_s*Δp/(6356*η)",
                "A_cl = Q_s/AC"},
               plumb::rules::unit_scale);
    for (const char* formula : {"v = 353.7*Q_a/D_mm^2", "P_bhp = Q_ac*Δp/(6356*η)",
                                "A_cl = Q_ac/AC", "v = 353.7*Q_n*T/(273.15 {K})/D_mm^2"}) {
        CAPTURE(formula);
        CHECK(count_of(run(decl, formula), plumb::rules::unit_scale) == 0);
    }
}

TEST_CASE("an actual gas volume converted between units but not to reference conditions") {
    const std::string air = "Q_leakNm : Nm3/min\nQ_leak : cfm\nQ_s : scf/min\n";
    fails_with(air, {"Q_leakNm = Q_leak/35.31", "Q_leakNm = Q_leak*0.02832"},
               plumb::rules::unit_scale);
    // L/min into Nm³/h by 0.06 (60 min/h over 1000 L/m³ folded) is the same slip as by 60/1000.
    const std::string ward = "q_w : L/min \"oxygen at the wards\"\nQ_N : Nm3/h\n";
    fails_with(ward, {"Q_N = 0.06*q_w", "Q_N = q_w*60/1000"}, plumb::rules::unit_scale);
    passes(air, {"Q_leakNm = Q_s/37.3"});
}

// A compressor's free air delivered (FAD) is stated at the intake (ISO 1217, from memory), some
// 15 to 35 °C, which the trade turns into scfm by the volume factor alone (28.32 L per ft³, NIST
// SP 811 (2008), B.8, rounded): within a few per cent of 60 °F, a note. Into Nm³ at 0 °C it is
// 5 to 13 % off and stays a warning, as does an actual volume that is not described as free air.
TEST_CASE("free air into standard volumes by the unit alone") {
    const std::string air = "Q_fad : L/min \"free-air consumption, l/min FAD\"\n"
                            "Q_line : L/min \"flow in the line\"\nQ_scfm : scfm\nQ_n : Nm3/min\n";
    const auto note = run(air, "Q_scfm = Q_fad/28.32");
    CHECK(problems_in(note) == 0);
    CHECK(count_of(note, plumb::rules::trade_constant) == 1);
    fails_with(air, {"Q_scfm = Q_line/28.32", "Q_n = Q_fad/1000", "Q_scfm = Q_fad*28.32"},
               plumb::rules::unit_scale);
}

// A soil-vapour extraction well's removal rate ṁ = C·Q (common practice): a concentration per
// standard m³ times the blower's actual flow (acfm, or a flow described as actual) counts the
// gas as if at the standard state. With the standard flow, or with the state correction
// (p/p_n)·(T_n/T) written in, it passes (1 ft³ = 0.028316846592 m³, 1 lb = 453592.37 mg,
// NIST SP 811 (2008), B.8).
TEST_CASE("a concentration per standard volume times an actual flow") {
    const std::string decl = "C_mg : mg/Sm3\nQ_a : acfm\nQ_s : scfm\nQ_m : m^3/h \"actual flow\"\n"
                             "m_lb : lb/d\nm_g : mg/h\np, p_n : kPa\nT, T_n : K\n";
    fails_with(decl, {"m_lb = C_mg*Q_a*0.02832*1440/453592", "m_g = C_mg*Q_m"},
               plumb::rules::unit_scale);
    passes(decl, {"m_lb = C_mg*Q_s*0.02832*1440/453592", "m_g = C_mg*Q_m*(p/p_n)*(T_n/T)"});
}

// A flare's heat release P = Q·LHV (common practice) with the heating value per Nm³ (methane's
// 35.8 MJ/Nm³, from memory) or per scf: times the actual flow at 35 °C and the train's pressure
// it counts the gas as if at the reference state, some 12 % high. A heating value per volume
// has a pressure's dimension, which must not read as a pressure correcting the state. With the
// normal flow, or the correction (p/p_n)·(T_n/T) written in, it passes (1 h = 3600 s, SI
// Brochure 9th ed., Table 8).
TEST_CASE("a heating value per reference volume times an actual flow") {
    const std::string decl = "LHV_n : MJ/Nm3\nLHV_s : Btu/scf\nQ_a : m^3/h \"actual gas flow\"\n"
                             "Q_acfm : acfm\nQ_n : Nm3/h\nQ_scfm : scfm\nP_th : MW\nH : Btu/h\n"
                             "y : 1\np, p_n : kPa\nT, T_n : K\n";
    fails_with(decl, {"P_th = Q_a*y*LHV_n/3600", "H = Q_acfm*LHV_s*60"}, plumb::rules::unit_scale);
    passes(decl, {"P_th = Q_n*y*LHV_n/3600", "H = Q_scfm*LHV_s*60",
                  "P_th = Q_a*(p/p_n)*(T_n/T)*y*LHV_n/3600"});
}

// A fan sized in acfm from a flow in Nm³/h by the volume factor alone, 0.5886 cfm per m³/h or
// 1.699 m³/h per cfm (NIST SP 811 (2008), B.8, rounded): the gas at the fan's outlet is hot and
// the fan comes out small. A factor near 1 that could be the state correction folded in, or
// a flow its description calls normal, is left alone.
TEST_CASE("a normal flow turned into acfm by the volume factor alone") {
    const std::string decl = "V_N : Nm3/h\nV_acfm : acfm\nQ_cfm : cfm \"blower air, normal\"\n";
    fails_with(decl, {"V_acfm = 0.5886*V_N", "V_acfm = V_N/1.699"}, plumb::rules::unit_scale);
    passes(decl, {"Q_cfm = 0.5886*V_N", "V_acfm = 0.5886*V_N*1.33"});
}

// A fan's shaft power P = Q·Δp/η takes the actual flow through it (common practice): from the
// normal flow of a kiln's exit gas at 350 °C it is 2.3 times too small. The actual flow, a
// state correction written in, or a compressor's isothermal work p_n·V_n·ln(p_2/p_1) at the
// flow's own reference state are no such slip.
TEST_CASE("a fan's power from a flow at reference conditions") {
    const std::string decl = "P_f : kW\nV_n : Nm3/h\nV_a : m^3/h\nΔp_f : Pa\nη_f : 1\n"
                             "T, T_n : K\np_n : kPa \"normal pressure\"\np_1, p_2 : kPa\n";
    fails_with(decl, {"P_f = V_n*Δp_f/(3600*1000*η_f)"}, plumb::rules::unit_scale);
    passes(decl, {"P_f = V_a*Δp_f/(3600*1000*η_f)", "P_f = V_n*(T/T_n)*Δp_f/(3600*1000*η_f)",
                  "P_f = p_n*V_n*ln(p_2/p_1)/3600"});
}

// A filter's air scour rate in Nm³/(m²·h) (common practice) times its area, set equal to the
// blower's actual flow: the same slip as Q_act = Q_n, inside a product. With the state
// correction (p_n/p)(T/T_n) it passes; a normal flow on the left is no slip.
TEST_CASE("an actual gas flow set equal to a product holding a normal volume") {
    const std::string air = "r_air : Nm3/(m^2*h)\nA_f : m^2\nQ_act : m^3/h\nQ_N : Nm3/h\n"
                            "p : kPa\nT : K\n";
    fails_with(air, {"Q_act = r_air*A_f"}, plumb::rules::unit_scale);
    passes(air, {"Q_N = r_air*A_f"});
    passes(air, {"Q_act = r_air*A_f*(101.325/p)*(T/273.15)"}, 2);
}

// Gas volumes at two reference states: 1 Nm³ (0 °C, 101.325 kPa, DIN 1343) = 1.0549 Sm³
// (15 °C, ISO 13443) = 37.33 scf (60 °F, 14.696 psia), the volume factor 35.3147 ft³/m³
// (NIST SP 811 (2008), B.8) times the reference temperatures' ratio (ideal gas; the
// reference states from memory). The volume factor alone is a warning; with the
// temperatures it passes. 15 °C and 60 °F are 0.2 % apart, which the trade lets 35.31 cover
// (common practice).
TEST_CASE("gas volumes at two reference temperatures converted by the volume factor alone") {
    const std::string gas = "V_n : Nm3/h\nV_s : Sm3/h\nV_us : scf/h\nV_m : Mscf/d\n";
    fails_with(gas,
               {"V_us = 35.31*V_n", "V_s = V_n", "V_m = V_n*24*35.31/1000", "V_n = V_us/35.31",
                "V_us = 33.4*V_n"},
               plumb::rules::unit_scale);
    const auto r = run(gas, "V_us = 35.31*V_n");
    CHECK(plumb::test::says(first_under(r, plumb::rules::unit_scale),
                            "at 60 °F and '35.31*V_n' at 0 °C"));
    passes(gas, {"V_us = 37.3*V_n", "V_us = 37.33*V_n", "V_us = 35.31*V_s", "V_us = 35.38*V_s",
                 "V_s = 1.055*V_n", "V_m = V_n*24*37.3/1000", "V_n = V_us/37.3"});
    passes(gas, {"V_n = V_s*273.15/288.15", "V_s = V_n*288.15/273.15", "V_n = 0.948*V_s"});
    // The temperatures' ratio turned over is 1.0549² = 11.3 % off, and said so.
    fails_with(gas, {"V_n = V_s*288.15/273.15", "V_n = V_s*1.0549", "V_s = V_n*273.15/288.15"},
               plumb::rules::unit_scale);
    CHECK(plumb::test::says(
        first_under(run(gas, "V_n = V_s*288.15/273.15"), plumb::rules::unit_scale),
        "turned over: as written the result is 11.3 % off"));
    // A standard cubic foot the description puts at 68 °F (the US EPA's, 40 CFR 60.2, from
    // memory): 1 scfm = 60 × 0.0283168 × 273.15/293.15 = 1.583 Nm³/h, and the volume factor
    // 1.699 alone is 7.3 % off; the warning names the stated temperature.
    const std::string epa = "Q_s : scfm \"exhaust, dry standard at 68 °F\"\nQ_n : Nm3/h\n";
    passes(epa, {"Q_n = 1.583*Q_s"});
    const auto off = run(epa, "Q_n = 1.699*Q_s");
    CHECK(count_of(off, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(first_under(off, plumb::rules::unit_scale), "at 68 °F"));
}

// A leak's flow at line pressure from a table at 100 psig, scaled by absolute pressure:
// Q = Q_100·(p_g + 14.7)/(100 + 14.7) (US DOE Compressed Air Sourcebook, from memory; common
// practice). The added numbers are a gauge reading and the atmosphere in the unit of the
// absolute pressure above them; read so, the ratio is pure. Without the atmosphere, or
// multiplied, it stays a finding.
TEST_CASE("a gauge reading plus the atmosphere, typed as numbers, in ratio with a pressure") {
    const std::string leaks = "Q_100, Q : cfm\np_g : psig\np_a : psia\n";
    passes(leaks, {"Q = Q_100*(p_g + 14.7)/(100 + 14.7)", "Q = Q_100*p_a/(100 + 14.7)"}, 1);
    fails_with(leaks, {"Q = Q_100*(p_g + 14.7)/(100 + 20)", "Q = Q_100*(p_g + 14.7)*(100 + 14.7)"},
               plumb::rules::side_mismatch);
}

// Partial pressures add to one absolute pressure (Dalton's law; a steam-air chamber's
// p = p_sat + p_air, PDA Technical Report 1, from memory): set equal to a gauge reading the
// zeros differ. Equal to an absolute one it passes, and a difference of two stays a difference.
TEST_CASE("absolute pressures added are one absolute reading, not a gauge one") {
    const std::string chamber = "p_g : barg\np_a, p_sat, p_air : bar\n";
    passes(chamber, {"p_a = p_sat + p_air", "p_g = p_sat - p_air"});
    fails_with(chamber, {"p_g = p_sat + p_air", "p_g <= p_sat + p_air"},
               plumb::rules::offset_scale);
}

// The saturator pressure of dissolved air flotation in atmospheres, P = (p + 101.35)/101.35
// with p in kPa gauge (Metcalf & Eddy, 4th ed., ch. 14, from memory, printing 101.35 for
// 101.325): the atmosphere read within its handbook rounding, both to make the gauge reading
// absolute and to find it added twice to an absolute one.
TEST_CASE("the atmosphere printed 101.35 kPa is the atmosphere") {
    const std::string daf = "p_g : kPag\np_abs : kPa \"absolute transmitter\"\nP : 1\n";
    passes(daf, {"P = (p_g + 101.35)/101.35"}, 1);
    fails_with(daf, {"P = (p_abs + 101.35)/101.35"}, plumb::rules::offset_scale);
}

// 14.5 psi per bar (NIST SP 811 (2008), B.8: 1 bar = 14.5038 psi) dividing a drop in psi is
// the bar's conversion, not a reference pressure: the US bases in psi are 14.696, 14.7 and
// 14.73 psia (common practice), which stay read as such.
TEST_CASE("14.5 over a pressure in psi is the bar, not a reference state") {
    const std::string drops = "Δp_a, Δp_b, Δp_t : bar \"pressure drop\"\nΔp_f : psi "
                              "\"filter pressure drop\"\n";
    passes(drops, {"Δp_t = Δp_a + Δp_b + Δp_f/14.5"});
    const std::string gas = "q_s, q_a : cfm\np_f : psia\nT_R : °R\n";
    passes(gas, {"q_s = q_a*(p_f/14.7)*(520/T_R)"}, 2);
}

// A stack's absolute pressure from the test day's barometer and the static gauge reading in
// mbar: p_s = p_b + p_g/10 in kPa (EPA Method 2, from memory; 10 mbar = 1 kPa, SI Brochure 9th
// ed.). The 10 takes the reading into the barometer's unit and weighs nothing; with both in
// kPa the same 10 weighs a tenth of the reading, and the sum is no reading.
TEST_CASE("a gauge reading divided into the barometer's unit is added whole") {
    const std::string stack = "p_b : kPa \"barometric pressure, test day\"\np_sup : mbarg "
                              "\"stack static\"\np_g : kPag\np_s : kPa \"stack absolute\"\n";
    passes(stack, {"p_s = p_b + p_sup/10"});
    fails_with(stack, {"p_s = p_b + p_g/10"}, plumb::rules::offset_scale);
    fails_with(stack, {"p_s = p_b + p_sup"}, plumb::rules::unit_scale);
}

// Air and fuel gas in Nm³/h added are still gas at 0 °C, not the flue gas at its temperature:
// over the flue's area they give no velocity without the state's correction (ideal gas,
// common practice). Corrected by the absolute temperature ratio, they pass.
TEST_CASE("a sum of normal flows over an area is no velocity either") {
    const std::string d = "V_a, V_n : Nm3/h\nA : m^2\nv : m/s\nT : K\n";
    const auto r = plumb::test::check_after(d, "v = (V_a + V_n)/(3600*A)");
    CHECK(plumb::test::count_of(r, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::problems_in(
              plumb::test::check_after(d, "v = (V_a + V_n)/(3600*A)*T/273.15")) == 0);
}

// EN 12828's expansion vessel, V_n = V_e·(p_e + 1)/(p_e - p_0) with the pressures in bar g (EN
// 12828:2012, Annex D, from memory): the 1 is the atmosphere rounded to 1 bar, 1.3 % under the
// standard one, and with it the numerator is an absolute pressure. 100 in kPa alike. A site's
// own barometer typed there, 0.95 bar (about 540 m up) or 14.5 psi (about 110 m up, by the
// standard atmosphere's barometric formula, from memory), is read as it, with a note that says
// the height; a number no atmosphere has (0.3 bar, 1 psi) or none at all stays an error.
TEST_CASE("the atmosphere rounded to 1 bar inside an expansion vessel's ratio") {
    const std::string decl = "p_e, p_0 : barg\np_k, p_k0 : kPag\np_s, p_s0 : psig\nV_n, V_e : L\n";
    passes(decl, {"V_n = V_e*(p_e + 1)/(p_e - p_0)", "V_n = V_e*(p_k + 100)/(p_k - p_k0)",
                  "V_n = V_e*(p_e + 1.013)/(p_e - p_0)"});
    for (const char* site :
         {"V_n = V_e*(p_e + 0.95)/(p_e - p_0)", "V_n = V_e*(p_s + 14.5)/(p_s - p_s0)"}) {
        CAPTURE(site);
        const auto r = plumb::test::check_after(decl, site);
        CHECK(plumb::test::problems_in(r) == 0);
        CHECK(plumb::test::says(first_under(r, plumb::rules::trade_constant),
                                "is read as the atmospheric pressure where the gauge is"));
    }
    fails_with(decl,
               {"V_n = V_e*(p_e + 0.3)/(p_e - p_0)", "V_n = V_e*(p_s + 1)/(p_s - p_s0)",
                "V_n = V_e*p_e/(p_e - p_0)"},
               plumb::rules::offset_scale);
}

// NPSH available from an absolute suction pressure takes no barometer; from a gauge one it
// does (NPSH_a = (p_g + p_b - p_v)/(ρ·g), Hydraulic Institute 9.6.1, from memory): a pressure
// the file calls absolute, with the barometer added again, counts the atmosphere twice.
TEST_CASE("the barometer added to a pressure already absolute") {
    const std::string decl = "p_b : kPa \"site barometric pressure\"\n"
                             "p_abs : kPa \"absolute pressure at the suction\"\n"
                             "p_a : psia\np_bp : psi \"barometer\"\np_v, p_vp : kPa\n"
                             "p_g : kPag\nH : m\nρ : kg/m^3\ng : m/s^2\nH_ft : ft\n"
                             "γ : lbf/ft^3\np_vap : psi\n";
    fails_with(decl, {"H = (p_abs + p_b - p_v)*1000/(ρ*g)", "H_ft = (p_a + p_bp - p_vap)*144/γ"},
               plumb::rules::offset_scale);
    passes(decl, {"H = (p_abs - p_v)*1000/(ρ*g)", "H_ft = (p_a - p_vap)*144/γ"});
}

// A gauge reading set equal to an absolute pressure is told what to add: the barometer the
// file declares in the reading's unit, or the one in another unit with its conversion, never
// a symbol in another unit bare (1 bar = 14.5038 psi; NIST SP 811 (2008), B.8). A reference
// temperature beside °R readings is declared in °R (60 °F = 519.67 °R, NIST SP 811, 4.2.1.1).
TEST_CASE("the advice names an atmosphere in the reading's unit, and a reference in its system") {
    const std::string bar_only = "p_atm : bar \"atmospheric pressure\"\np_pu : psia\np_g : psig\n";
    const auto words = run(bar_only, "p_pu = p_g");
    CHECK(plumb::test::says(first_under(words, plumb::rules::offset_scale),
                            "write (p_g + p_atm*14.5038)"));
    CHECK(!plumb::test::says(first_under(words, plumb::rules::offset_scale), "(p_g + p_atm)"));
    const std::string psi_too = bar_only + "p_b : psia \"site barometric pressure\"\n";
    const auto named = run(psi_too, "p_pu = p_g");
    CHECK(plumb::test::says(first_under(named, plumb::rules::offset_scale), "write (p_g + p_b)"));
    const auto rankine = run("V_a, V_b : ft^3\nT_f : °R\n", "V_b = V_a*(519.67/T_f)");
    CHECK(plumb::test::says(first_under(rankine, plumb::rules::trade_constant),
                            "T_n : \u00B0R = 519.67"));
}

// NPSH_a = (p_s,abs - p_v)/(ρ·g) + v²/(2g) (Karassik, Pump Handbook, 4th ed., ch. 2, from
// memory): a suction gauge reading less the vapour pressure is short by the atmosphere the
// gauge reads from, which at a site whose barometer the file declares is that barometer.
TEST_CASE("a gauge reading less an absolute one names the site's barometer") {
    const std::string site = "p_b : kPa \"site barometric pressure, 97.8 kPa\"\n"
                             "p_sg : kPag\np_v : kPa\nρ : kg/m^3\nH : m\n";
    const auto r = run(site, "H = (p_sg - p_v)*1000/(ρ*{g_n})");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "off by the atmosphere the gauge reads from: the site's barometer "
                            "'p_b' (97.8 kPa)"));
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "write (p_sg + p_b)"));
    const auto sea =
        run("p_sg : kPag\np_v : kPa\nρ : kg/m^3\nH : m\n", "H = (p_sg - p_v)*1000/(ρ*{g_n})");
    CHECK(plumb::test::says(first_under(sea, plumb::rules::offset_scale),
                            "off by 101325 Pa, the atmosphere the gauge reads from"));
}

// A sprinkler's p = (q/K)² (EN 12845 and NFPA 13, from memory) and a column's ρ·g·h are the
// pressure above what lies at their far end: the atmosphere, for a head discharging into a
// room or an open tank. Set alone equal to a pressure the file calls absolute, the barometer
// is missing (common practice); a barometer's own column (p_b = ρ_Hg·g·h, its top a vacuum)
// is absolute, and so is the column plus the barometer.
TEST_CASE("an absolute pressure set equal to a drop or a column alone") {
    const std::string decl =
        "p_fa : kPa \"vessel pressure, absolute\"\np_ha : bar(a)\n"
        "p_b : kPa \"site barometer\"\np_h : bar(g)\nΔp : kPa \"drop across the valve\"\n"
        "p_bot : psia\nq : L/min\nK : L/(min*bar^0.5)\nρ, ρ_Hg : kg/m^3\nh, h_Hg : m\nh_ft : "
        "ft\nSG : 1\n";
    const auto r = run(decl, "p_fa = (q/K)^2*100");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    const plumb::diagnostic& d = first_under(r, plumb::rules::offset_scale);
    CHECK(d.level == plumb::severity::warning);
    CHECK(plumb::test::says(d, "'p_fa' (vessel pressure, absolute) is an absolute pressure, but "
                               "'(q/K)^2*100' is a pressure difference alone"));
    CHECK(plumb::test::says(d, "add the site's barometer"));
    fails_with(decl,
               {"p_ha = (q/K)^2", "p_bot = 0.433*SG*h_ft", "p_fa = ρ*{g_n}*h/1000",
                "p_fa = ρ*9.81*h/1000"},
               plumb::rules::offset_scale);
    passes(decl, {"p_h = (q/K)^2", "p_fa = (q/K)^2*100 + p_b", "p_fa = p_b + ρ*{g_n}*h/1000",
                  "Δp = (q/K)^2*100", "p_b = ρ_Hg*{g_n}*h_Hg/1000"});
    passes(decl, {"p_fa = p_b + ρ*9.81*h/1000"}, 1);
}

// The normal litre, NL, a thousandth of a normal cubic metre at 0 °C and 101.325 kPa (DIN 1343,
// as gas suppliers write ward and process flows; common practice): 1 NL/min = 0.06 Nm³/h. A
// flow in NL/min is at reference conditions as Nm³/h is, and set equal to an actual flow in
// L/min it still differs by the gas's state.
TEST_CASE("a flow in normal litres is at reference conditions") {
    const std::string decl = "measure NL = 0.001 Nm3 \"normal litre\"\nQ_NLmin : NL/min\n"
                             "Q_N : Nm3/h\nQ_act : L/min \"actual flow at the outlet\"\n"
                             "V_free : NL\nt : h\n";
    passes(decl, {"Q_N = 0.06*Q_NLmin", "Q_N = 0.001*V_free/t"});
    fails_with(decl, {"Q_act = Q_NLmin"}, plumb::rules::unit_scale);
}

// A name that starts with a d is a difference only where the d stands before the quantity's
// letter (dT, dp_f, dPe, d_T, dh): a discharge or dew-point temperature in kelvins set equal to
// a °C reading is still the zero slip (0 °C = 273.15 K, NIST SP 811 (2008), 4.2.1.1).
TEST_CASE("a name beginning with d is no difference unless the d marks one") {
    const std::string decl = "t_C : °C\ndisch_T, dew_t, d3, dT, d_T : K\n";
    fails_with(decl, {"t_C = disch_T", "t_C = dew_t", "t_C = d3"}, plumb::rules::offset_scale);
    passes(decl, {"dT = t_C - t_C", "d_T = 1*dT"});
    const std::string drops = "p_2 : kPag\np_1 : kPag\ndp_f, dPe, dh : kPa\n";
    passes(drops, {"p_2 = p_1 - dp_f - dPe - dh"});
}

// A grouting pressure on the packer's gauge held below the overburden, σ_v = γ·z, zero at the
// ground and so counted from the atmosphere (common practice), through a symbol in kPa taken
// to bar by 100 (NIST SP 811 (2008), B.8): a stress converted by numbers is a stress still.
TEST_CASE("a stress converted by a number beside a gauge reading") {
    const std::string decl = "σ_v : kPa \"overburden at the packer\"\np_gr : barg\n";
    passes(decl, {"p_gr <= σ_v/100"});
}

// A compressor's adiabatic work, k/(k − 1)·p_1·V̇·((p_2/p_1)^((k−1)/k) − 1) (GPSA, compressors,
// from memory), takes the absolute suction pressure; a gauge reading there is the zero slip, as
// in the isothermal p·V̇·ln(p_2/p_1). A pump's p_g·Q from a vented tank stays a hydraulic power.
TEST_CASE("a gauge reading in a gas's adiabatic compression") {
    const std::string decl = "k, r_c, η_c : 1\np_g : kPag \"suction pressure\"\n"
                             "p_a : kPa \"suction pressure, absolute\"\nV_s : m^3/s\nP_kW : kW\n";
    fails_with(decl, {"P_kW = k/(k - 1)*p_g*V_s*(r_c^((k - 1)/k) - 1)/η_c"},
               plumb::rules::offset_scale);
    passes(decl, {"P_kW = k/(k - 1)*p_a*V_s*(r_c^((k - 1)/k) - 1)/η_c", "P_kW = p_g*V_s/η_c"});
}

// A column's foot is at the atmosphere above it plus the column, p = p_b + ρ·g·h (hydrostatics;
// any fluids text): at a site whose barometer the file declares, the sea level's 101.325 kPa
// added to the column is the site's atmosphere missed, as it is beside a gauge reading. An
// aeration calc at standard conditions, where the sum stands over 101.325 again, is set at the
// sea level's atmosphere throughout (ASCE 2-06's standard conditions, from memory).
TEST_CASE("a column's pressure plus the sea-level atmosphere where the site's is declared") {
    const std::string site = "p_b : kPa \"site barometric pressure, 95.0 kPa\"\n"
                             "ρ : kg/m^3\nh, z : m\np_abs : kPa\nO_t : %\nC_s, C_m : mg/L\n"
                             "p_z : kPa \"water column over the diffusers\"\n";
    fails_with(site, {"p_abs = ρ*{g_n}*h/1000 + 101.325", "p_abs = 101.325 + p_z"},
               plumb::rules::offset_scale);
    const auto r = run(site, "p_abs = ρ*{g_n}*h/1000 + 101.325");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "write p_b in place of 101.325"));
    passes(site, {"p_abs = ρ*{g_n}*h/1000 + p_b", "p_abs = p_b + p_z"});
    passes(site, {"C_m = C_s*0.5*((101.325 + p_z)/101.325 + O_t/21)"}, 2);
    // With no site barometer declared, the sea level's is the trade's reading.
    passes("ρ : kg/m^3\nh : m\np_abs : kPa\n", {"p_abs = ρ*{g_n}*h/1000 + 101.325"}, 1);
}

// A vacuum gauge reads how far the pressure is below the barometer, so the absolute pressure
// is the barometer less the vacuum (a condenser's back pressure, 27.4 inHg of vacuum under a
// 29.92 inHg barometer, is 2.5 inHg absolute; common practice; 1 inHg = 3.386389 kPa, NIST SP
// 811 (2008), B.8). A vacuum typed in for the absolute pressure is 11 times too high there;
// negated it is the gauge reading, and converted it is the vacuum in another unit.
TEST_CASE("a vacuum set equal to an absolute pressure") {
    const std::string plant = "p_b : kPa \"site barometric pressure, 99.1 kPa\"\n"
                              "p_vac : inHg \"condenser vacuum on the hotwell gauge\"\n"
                              "p_c : kPa \"condenser absolute pressure\"\n"
                              "vac_kPa : kPa \"the same vacuum below the barometer\"\n"
                              "p_g : kPag \"condenser pressure on the DCS\"\n"
                              "p_ch : kPa \"chamber vacuum pulse, absolute\"\n";
    fails_with(plant, {"p_c = 3.386*p_vac", "p_c = p_vac*3.386", "p_c = vac_kPa"},
               plumb::rules::offset_scale);
    const auto r = run(plant, "p_c = 3.386*p_vac");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "the absolute pressure is the barometer less the vacuum"));
    CHECK(
        plumb::test::says(first_under(r, plumb::rules::offset_scale), "write (p_b - 3.386*p_vac)"));
    passes(plant, {"p_c = p_b - 3.386*p_vac", "vac_kPa = 3.386*p_vac", "p_g = -3.386*p_vac",
                   "p_g = -vac_kPa", "p_ch = p_c"});
}

// A steam header's gauge in psig made absolute in bar for the steam table: p/14.5 + p_b/1000
// with the barometer in mbar (1 bar = 14.50377 psi, NIST SP 811 (2008), B.8). The rounded
// 14.5 is 0.026 % off, within its digits; the sum takes the unit it rounds, bar, as a sum of
// differences does. The barometer left in mbar is still reported.
TEST_CASE("a gauge reading converted by a rounded factor plus the barometer in another unit") {
    const std::string header = "p_st_a : bar \"steam header, absolute\"\n"
                               "p_b : mbar \"site barometer, 1003 mbar\"\np_g : psig\n";
    passes(header, {"p_st_a = p_g/14.5 + p_b/1000", "p_st_a = p_g/14.5038 + p_b/1000",
                    "p_st_a = p_g*0.06895 + p_b/1000"});
    CHECK(problems_in(run(header, "p_st_a = p_g/14.5 + p_b")) >= 1);
    CHECK(problems_in(run(header, "p_st_a = p_g/145 + p_b/1000")) >= 1);
}

// A Bourdon gauge reads above the barometer whatever its dial's unit is called (ASME B40.100,
// from memory): a US sheet's "58 psi" on a skid gauge is 58 psig. Typed in for the absolute
// pressure a steam table wants, it is one atmosphere short (4.0 bar where 5.0 bar abs is
// right; 1 bar = 14.50377 psi, NIST SP 811 (2008), B.8). With the barometer added it is right;
// a strain gauge's stress or a differential gauge's reading is no such reading.
TEST_CASE("a pressure whose words say a gauge reads it set equal to an absolute one") {
    const std::string skid = "p_st_a : bar \"steam header, absolute\"\n"
                             "p_b : mbar \"site barometer, 1003 mbar\"\n"
                             "p_skid : psi \"steam header on the skid's pressure gauge, 58 psi\"\n"
                             "p_dp : psi \"differential pressure gauge across the strainer\"\n"
                             "p_a2 : psia \"header, absolute\"\n";
    fails_with(skid, {"p_st_a = p_skid/14.5", "p_a2 = p_skid"}, plumb::rules::offset_scale);
    const auto r = run(skid, "p_st_a = p_skid/14.5");
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale),
                            "write (p_skid/14.5 + p_b/1000)"));
    passes(skid, {"p_st_a = p_skid/14.5 + p_b/1000"});
    CHECK(count_of(run(skid, "p_st_a = p_dp/14.5"), plumb::rules::offset_scale) == 0);
}

// An injector's bottomhole pressure is held below a share of the fracture pressure, FG·D
// from a step-rate test, which a gauge reads (Bourgoyne et al., Applied Drilling Engineering,
// 1986, ch. 6, from memory): the share, a safety factor of 0.9, may be a declared pure number
// as well as a typed 0.9. A gradient times a depth set against an absolute reading is still
// reported.
TEST_CASE("a share of a gradient times a depth is a gauge reading's limit") {
    const std::string well = "p_bhg : psig \"bottomhole injection pressure\"\n"
                             "SF : 1 \"safety factor, 0.9\"\nFG : psi/ft \"fracture gradient\"\n"
                             "D : ft \"true vertical depth\"\np_a : psia\n";
    passes(well, {"p_bhg <= SF*FG*D", "p_bhg <= 0.9*FG*D", "p_bhg <= FG*D/SF"});
    fails_with(well, {"p_bhg <= p_a"}, plumb::rules::offset_scale);
}

// A pump's head from its discharge gauge, H = 2.31·p/SG in ft from psig (Hydraulic Institute,
// common practice; 2.31 ft of water per psi), with the slurry's specific gravity written as a
// ratio of its density to water's: a gauge reading scaled by a pure number still. A gauge
// reading over one density alone is no head, and stays an error.
TEST_CASE("a gauge reading over a specific gravity written as a ratio of densities") {
    const std::string pump = "H_ft : ft\np_d : psig\nρ_sl, ρ_w : kg/m^3\nH_m : m\np_k : kPag\n";
    passes(pump, {"H_ft = 2.31*p_d/(ρ_sl/ρ_w)", "H_ft = 2.31*p_d*ρ_w/ρ_sl"}, 1);
    passes(pump, {"H_m = p_k/(9.81*ρ_sl/ρ_w)"}, 1);
    CHECK(problems_in(run(pump, "H_ft = 2.31*p_d/ρ_sl")) >= 1);
}

// A sprinkler's or a nozzle's flow goes with the root of the pressure it discharges across to
// the atmosphere, Q = K·√p with p in psig (NFPA 13, from memory): balancing two heads by
// √(p_2/p_1) takes the gauge readings as they are. A gauge reading over an absolute one, or
// over one in another gauge unit, or the ratio without its root, is still reported.
TEST_CASE("the root of a ratio of two gauge readings is a nozzle's flow law") {
    const std::string heads = "q_n, q_r : gpm\np_h, p_r : psig\np_a : psia\np_b : barg\n";
    passes(heads, {"q_n = q_r*sqrt(p_h/p_r)", "q_n = q_r*(p_h/p_r)^0.5"});
    fails_with(heads,
               {"q_n = q_r*sqrt(p_h/p_a)", "q_n = q_r*sqrt(p_h/p_b)", "q_n = q_r*p_h/p_r",
                "q_n = q_r*(p_h/p_a)^0.5"},
               plumb::rules::offset_scale);
    // Read without the walk, the two readings still count as used.
    CHECK(count_of(run("q_n, q_r : gpm\np_h, p_r : psig\n", "q_n = q_r*sqrt(p_h/p_r)"),
                   plumb::rules::unused) == 0);
}

// "mmHg abs, as the old vacuum recorder logs it": "abs" and "(a)" call a pressure absolute
// as "absolute" does, whatever instrument its words name.
TEST_CASE("a pressure called abs beside the word vacuum is no vacuum") {
    const std::string suction = "p_1 : kPa \"suction, absolute\"\n"
                                "p_mm : mmHg \"suction, mmHg abs, off the vacuum recorder\"\n"
                                "p_v : mmHg \"suction vacuum on the recorder\"\n";
    passes(suction, {"p_mm = 7.50062*p_1"});
    fails_with(suction, {"p_v = 7.50062*p_1"}, plumb::rules::offset_scale);
}

// A gas's density at standard conditions, ρ_S = M·p_S/(R·T_S) at 101.325 kPa and 15 °C
// (ISO 13443), is defined at the sea level's pressure wherever the plant is; the air's density
// where the plant is takes the site's barometer. Beside 288.15 K the atmosphere is the
// reference state's, beside the gas's own temperature it is still reported.
TEST_CASE("the atmosphere beside a standard reference temperature is a reference state") {
    const std::string site = "p_b : kPa \"site barometer, 95.0 kPa\"\nρ_S, ρ_a : kg/m^3\n"
                             "M_g : kg/mol\nR_u : J/(mol*K)\nT_a : K\n";
    CHECK(count_of(run(site, "ρ_S = M_g*101325 {Pa}/(R_u*288.15 {K})"),
                   plumb::rules::offset_scale) == 0);
    CHECK(count_of(run(site, "ρ_S = M_g*101.325 {kPa}/(R_u*273.15 {K})"),
                   plumb::rules::offset_scale) == 0);
    CHECK(count_of(run(site, "ρ_a = M_g*101325 {Pa}/(R_u*T_a)"), plumb::rules::offset_scale) == 1);
}

// A normal volume corrected to the line's state, V = V_N·(101.325/p)·(T/273.15) (ideal gas,
// DIN 1343's normal state, from memory), with p in bar made kPa by its 100 beside it: the
// 101.325 is the normal pressure in the unit the 100 makes, as it is beside 1.01325 and bar.
// Without the 100, or with 10, the units still disagree.
TEST_CASE("a reference pressure beside a reading a power of ten converts") {
    const std::string line = "Q_a, Q_N : m^3/h\np_2a : bar \"absolute\"\nT_2 : K\nZ_2 : 1\n";
    passes(line, {"Q_a = Q_N*(101.325/(100*p_2a))*(T_2/273.15)*Z_2"}, 2);
    passes(line, {"Q_a = Q_N*101.325/(100*p_2a)"}, 1);
    CHECK(problems_in(run(line, "Q_a = Q_N*(101.325/p_2a)")) >= 1);
    CHECK(problems_in(run(line, "Q_a = Q_N*(101.325/(10*p_2a))")) >= 1);
}

// Nm³/h into scfm by the volume factor alone, 35.3147/60 = 0.588578 (NIST SP 811 (2008), B.8:
// 1 ft³ = 0.02831685 m³), leaves out the reference temperatures, 0 °C against 60 °F: 5.7 % low.
// Typed exact, or cut to 0.5885 from the rounded 35.31, it is the same slip; 37.33/60 =
// 0.6222, which holds the temperatures, passes.
TEST_CASE("a volume factor alone between normal and standard volumes, exact or cut") {
    const std::string decl = "Q_scfm : scfm\nQ_N : Nm3/h\n";
    fails_with(decl, {"Q_scfm = 0.58857*Q_N", "Q_scfm = 0.5885*Q_N", "Q_scfm = 0.5886*Q_N"},
               plumb::rules::unit_scale);
    passes(decl, {"Q_scfm = 0.6222*Q_N", "Q_scfm = 37.33*Q_N/60"});
}

// A sealed piezometer reads absolute; less the site's barometer it is the pore pressure above
// the atmosphere (common practice), with the barometer in hPa taken to kPa by 0.1 or /10 (NIST
// SP 811 (2008), B.8: 1 hPa = 100 Pa). The power of ten converts the barometer's unit and
// weighs nothing; the result is a gauge reading. Taken to 10 times the unit it is still off.
TEST_CASE("an absolute reading less a barometer a power of ten converts is a gauge reading") {
    const std::string piezometer = "p_v1 : kPag \"pore pressure\"\n"
                                   "p_n3 : kPa \"sealed gauge reading, absolute\"\n"
                                   "p_bh : hPa \"site barometer, 987 hPa\"\n";
    passes(piezometer, {"p_v1 = p_n3 - 0.1*p_bh", "p_v1 = p_n3 - p_bh/10"});
    CHECK(problems_in(run(piezometer, "p_v1 = p_n3 - p_bh")) >= 1);
    CHECK(problems_in(run(piezometer, "p_v1 = 10*p_n3 - p_bh")) >= 1);
}
