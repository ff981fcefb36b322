// Corpus generation for plumb_bench. The formula shapes are the ones a consulting office's calc
// files are full of; each shape that can be got wrong carries one realistic mistake, so the
// diagnostic path is timed too and its verdicts can be counted.
#include "corpus.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <fstream>
#include <stdexcept>
#include <string>

namespace plumb_bench {
namespace {

// splitmix64: tiny, and its output is fixed by its definition, unlike the standard library's
// distributions, which may differ between implementations.
class rng {
  public:
    explicit rng(std::uint64_t start) : state_(start) {}

    std::uint64_t next() {
        std::uint64_t z = (state_ += 0x9e3779b97f4a7c15ULL);
        z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
        z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
        return z ^ (z >> 31);
    }
    std::size_t below(std::size_t n) { return static_cast<std::size_t>(next() % n); }
    bool per_mille(unsigned n) { return below(1000) < n; }

  private:
    std::uint64_t state_;
};

// Symbols for fluids, heat transfer and structures, declared the ways real dictionaries mix:
// by unit, by bracket dimension, shared declarations, named constants, UTF-8 names.
constexpr std::string_view dictionary_text =
    R"dict(# dictionary.plumb: symbols shared by every calc file in this set.
# SI unless stated. Keep one symbol per meaning; station suffixes _1.._3 follow the flow.

# --- constants -------------------------------------------------------------------------
g_n   : m/s^2 = 9.80665          "standard acceleration of gravity (NIST SP 811)"
p_atm : Pa = 101325              "standard atmosphere (NIST SP 811)"
σ_SB  : W/(m^2*K^4) = 5.670374419e-8 "Stefan-Boltzmann constant (CODATA 2018)"
g     : [L T^-2]                 "local gravitational acceleration"

# --- fluid properties ------------------------------------------------------------------
ρ              : kg/m^3          "density of the flowing fluid"
ρ_w, ρ_a, ρ_m  : [M L^-3]        "density of water, air, manometer liquid"
μ              : Pa*s            "dynamic viscosity"
ν              : m^2/s           "kinematic viscosity"
γ              : [M L^-2 T^-2]   "specific weight"
K_v            : Pa              "bulk modulus"
β              : [M^-1 L T^2]    "compressibility"
c              : m/s             "speed of sound in the fluid"
σ_st           : N/m             "surface tension"
p_v            : Pa              "vapour pressure"

# --- geometry ---------------------------------------------------------------------------
L, L_e         : m               "pipe length, equivalent length of fittings"
D, D_h         : m               "inside diameter, hydraulic diameter"
D_1, D_2, D_3  : m               "inside diameter at station"
ε              : m               "absolute roughness"
A              : m^2             "flow area"
A_1, A_2, A_3  : [L^2]           "flow area at station"
A_o            : [L·L]           "orifice or nozzle area"
P_w            : m               "wetted perimeter"
R_h            : m               "hydraulic radius"
y              : m               "depth, or distance from the wall"
b_c            : m               "channel bottom width"
S_0, S_f       : 1               "bed slope, friction slope"
z_1, z_2, z_3  : m               "elevation of station above datum"
Δz             : m               "elevation difference"

# --- flow -------------------------------------------------------------------------------
V              : m/s             "mean velocity"
V_1, V_2, V_3  : [L T^-1]        "mean velocity at station"
V_max          : m/s             "velocity limit (erosion, noise)"
ΔV             : m/s             "sudden velocity change"
u              : m/s             "local velocity"
Q              : m^3/s           "volumetric flow rate"
Q_1, Q_2, Q_3  : [L^3 T^-1]      "flow rate in branch"
m_dot          : kg/s            "mass flow rate"
p              : Pa              "pressure"
p_1, p_2, p_3  : Pa              "pressure at station"
Δp             : Pa              "pressure drop"
Δp_max         : Pa              "allowable pressure drop"
τ, τ_w         : Pa              "shear stress, wall shear stress"
h_f, h_m, h_p, h_t, H : m        "friction loss, minor loss, pump head, turbine head, total head"
h_1, h_2       : m               "liquid level"
h_c            : m               "depth of centroid below the surface"
F_h            : N               "hydrostatic force on the gate"
F_D            : N               "drag force"
n_M            : [T L^(-1/3)]    "Manning roughness coefficient, SI form"
C_HW           : [L^(37/100) T^-1] "Hazen-Williams coefficient, SI form with its constant"
f              : 1               "Darcy friction factor"
K_L, K_ent, K_bend, K_exit, K_valve : [-] "loss coefficient"
C_d, C_D       : []              "discharge coefficient, drag coefficient"
Re, Fr, Ma, We : 1               "Reynolds, Froude, Mach and Weber numbers"
P_pump, P_shaft : W              "hydraulic power, shaft power"
P_turb         : W               "turbine output"
η_p, η_m, η_t  : 1               "pump, motor and turbine efficiency"
ω              : [T^-1]          "shaft angular speed"
T_q            : N*m             "shaft torque"

# --- heat transfer -----------------------------------------------------------------------
k, k_f, k_w    : W/(m*K)         "thermal conductivity: solid, fluid, wall"
h, h_i, h_o    : W/(m^2*K)       "film coefficient: mean, inside, outside"
U              : [M T^-3 Θ^-1]   "overall heat transfer coefficient"
q              : W               "heat rate"
q_flux         : W/m^2           "heat flux"
q_gen          : W/m^3           "volumetric heat generation"
Q_heat         : J               "heat transferred"
T, T_1, T_2, T_3 : K             "temperature"
T_s, T_inf, T_sur, T_i : K       "surface, free-stream, surroundings, initial temperature"
T_in, T_out    : [Θ]             "inlet and outlet temperature"
T_amb, T_amb_max : °C            "ambient temperature and its design maximum"
ΔT, ΔT_1, ΔT_2, ΔT_lm : [Th]     "temperature difference; log-mean"
β_T            : [Θ^-1]          "volumetric thermal expansion coefficient"
r, r_i, r_o    : m               "radius; inner and outer radius"
r_1, r_2       : m               "radius at the two faces"
L_c, L_w, L_fin : m              "characteristic length, wall thickness, fin length"
A_s            : m^2             "heat transfer surface"
A_cf           : m^2             "fin cross-section"
P_fin          : m               "fin perimeter"
m_fin          : [L^-1]          "fin parameter"
θ_b            : K               "fin base excess temperature"
Vol, Vol_1, Vol_2 : m^3          "volume"
m              : kg              "mass"
c_p, c_v       : J/(kg*K)        "specific heat capacity"
α              : m^2/s           "thermal diffusivity"
R_th, R_cond, R_conv : K/W       "thermal resistance"
Nu, Pr, Bi, Gr, Fo : 1           "Nusselt, Prandtl, Biot, Grashof and Fourier numbers"
ε_r            : 1               "emissivity"
t, t_1, t_2    : s               "time"
x              : m               "position through the wall"
W_b            : J               "boundary work"

# --- structures --------------------------------------------------------------------------
E, G           : Pa              "elastic and shear modulus"
ν_p            : 1               "Poisson's ratio"
f_y, f_u       : Pa              "yield and ultimate strength"
f_c'           : Pa              "specified compressive strength of concrete"
σ, σ_1, σ_2, σ_3 : Pa            "normal stress; principal stresses"
σ_x, σ_y, σ_h, σ_vm, σ_max : [M·L^-1·T^-2] "stress components, hoop, von Mises, peak"
τ_s, τ_xy      : Pa              "shear stress"
ε_s            : [-]             "strain"
α_T            : [Θ^-1]          "coefficient of thermal expansion"
M_b, M_y       : N*m             "bending moment about the strong and weak axis"
V_s            : N               "shear force"
P, P_cr        : N               "axial load; Euler critical load"
w              : N/m             "distributed load"
L_b            : m               "span"
I_z, I_y       : m^4             "second moment of area"
S_x, Z_x       : [L^3]           "elastic and plastic section modulus"
Q_s            : m^3             "first moment of area above the cut"
A_c            : m^2             "cross-section area"
b, t_w, y_c, x_c : m             "width, wall thickness, fibre distances"
r_g            : m               "radius of gyration"
K_e, λ, φ, θ   : 1               "effective length factor, slenderness, resistance factor, rotation"
δ, δ_max       : m               "deflection and its limit"
k_s            : N/m             "spring stiffness"
m_s            : kg              "vibrating mass"
ω_n, f_n       : [T^-1]          "natural circular frequency, natural frequency"
)dict";

enum class discipline { fluids, heat, structures };
constexpr std::array<std::string_view, 3> discipline_dir = {"fluids", "heat", "structures"};

// A formula pattern. `{a}` and `{b}` are two different station numbers 1..3, `{c}` a
// dimensionless coefficient. `broken` is the same formula with one mistake, or empty.
struct shape {
    discipline area;
    std::string_view tag; // used in labels, e.g. @darcy-12
    std::string_view note;
    std::string_view text;
    std::string_view broken;
    std::string_view rule;
};

constexpr std::string_view side = "side-mismatch";
constexpr std::string_view sum = "sum-mismatch";
constexpr std::string_view arg = "dimensioned-argument";
constexpr std::string_view args = "argument-mismatch";

constexpr auto F = discipline::fluids;
constexpr auto H = discipline::heat;
constexpr auto S = discipline::structures;

// clang-format off
constexpr std::array shapes = {
    // fluids
    shape{F, "darcy", "Darcy–Weisbach", "h_f = f*(L/D)*V^2/(2*g)", "h_f = f*(L/D)*V^2/2", side},
    shape{F, "darcy", "Darcy–Weisbach with fittings", "h_f = f*((L + L_e)/D_h)*V^2/(2*g_n)", "", ""},
    shape{F, "darcy", "Δp form", "Δp = f*(L/D)*ρ*V^2/2", "Δp = f*(L/D)*ρ*V^2/(2*g)", side},
    shape{F, "bernoulli", "energy equation, stations {a}-{b}",
          "p_{a}/(ρ*g) + V_{a}^2/(2*g) + z_{a} = p_{b}/(ρ*g) + V_{b}^2/(2*g) + z_{b} + h_f",
          "p_{a}/(ρ*g) + V_{a}^2/(2*g) + z_{a} = p_{b}/ρ + V_{b}^2/(2*g) + z_{b} + h_f", sum},
    shape{F, "bernoulli", "energy equation with pump and turbine",
          "p_1/γ + V_1^2/(2*g) + z_1 + h_p = p_2/γ + V_2^2/(2*g) + z_2 + h_t + h_f",
          "p_1/γ + V_1^2/(2*g) + z_1 + h_p = p_2/γ + V_2^2/(2*g) + z_2 + h_t + K_L*V_2^2", sum},
    shape{F, "bernoulli", "per unit mass",
          "p_{a}/ρ + V_{a}^2/2 + g*z_{a} = p_{b}/ρ + V_{b}^2/2 + g*z_{b}",
          "p_{a}/ρ + V_{a}^2/2 + z_{a} = p_{b}/ρ + V_{b}^2/2 + g*z_{b}", sum},
    shape{F, "reynolds", "Reynolds number", "Re = ρ*V*D/μ", "Re = ρ*V*D/ν", side},
    shape{F, "reynolds", "Reynolds number, kinematic", "Re = V*D_{a}/ν", "", ""},
    shape{F, "reynolds", "Reynolds number from mass flow", "Re = 4*m_dot/(π*D*μ)", "", ""},
    shape{F, "pump", "hydraulic power", "P_pump = ρ*g*Q*h_p/η_p", "P_pump = ρ*Q*h_p/η_p", side},
    shape{F, "pump", "shaft power", "P_shaft*η_p*η_m = ρ_w*g_n*Q*H", "", ""},
    shape{F, "turbine", "turbine output", "P_turb = η_t*ρ_w*g*Q_{a}*h_t", "", ""},
    shape{F, "pump", "shaft power from torque", "P_shaft = T_q*ω", "P_shaft = T_q", side},
    shape{F, "manning", "Manning, SI", "V = (1/n_M)*R_h^(2/3)*S_0^(1/2)",
          "V = (1/n_M)*R_h^(1/2)*S_0^(1/2)", side},
    shape{F, "manning", "Manning discharge", "Q = A*R_h^(2/3)*sqrt(S_f)/n_M", "", ""},
    shape{F, "manning", "Manning with pow", "V = pow(R_h, 2/3)*sqrt(S_0)/n_M", "", ""},
    shape{F, "channel", "hydraulic radius", "R_h = A/P_w", "", ""},
    shape{F, "hazen", "Hazen-Williams, SI", "V = 0.849*C_HW*R_h^0.63*S_f^0.54",
          "V = 0.849*C_HW*R_h^0.54*S_f^0.63", side},
    shape{F, "limit", "velocity limit", "V <= V_max", "V <= h_f", side},
    shape{F, "limit", "depth within the pipe", "0 <= y <= D", "", ""},
    shape{F, "limit", "turbulent", "Re > 4000", "", ""},
    shape{F, "limit", "allowable drop", "Δp ≤ Δp_max", "", ""},
    shape{F, "limit", "no cavitation", "p_{a} > p_v", "", ""},
    shape{F, "limit", "loss is positive", "h_f >= 0", "", ""},
    shape{F, "continuity", "continuity", "Q = A*V", "Q = A*V^2", side},
    shape{F, "continuity", "pipe area", "A = π*D^2/4", "", ""},
    shape{F, "continuity", "mass balance {a}-{b}", "ρ*A_{a}*V_{a} = ρ*A_{b}*V_{b}", "", ""},
    shape{F, "continuity", "mass flow", "m_dot = ρ*Q", "", ""},
    shape{F, "junction", "junction balance", "Q_1 + Q_2 = Q_3", "Q_1 + Q_2 = V_3*A_3 + V_1", sum},
    shape{F, "colebrook", "Colebrook–White",
          "1/sqrt(f) = -2*log10(ε/(3.7*D) + 2.51/(Re*sqrt(f)))", "", ""},
    shape{F, "swamee", "Swamee–Jain", "f = 0.25/(log10(ε/(3.7*D) + 5.74/Re^0.9))^2", "", ""},
    shape{F, "orifice", "orifice meter", "Q = C_d*A_o*sqrt(2*Δp/ρ)", "Q = C_d*A_o*sqrt(2*Δp)", side},
    shape{F, "orifice", "free discharge", "Q = C_d*A_o*sqrt(2*g*h_1)", "", ""},
    shape{F, "minor", "fittings", "h_m = (K_ent + K_bend + K_exit)*V^2/(2*g)",
          "h_m = (K_ent + K_bend + V)*V^2/(2*g)", sum},
    shape{F, "minor", "valve, vendor K", "h_m = {c}*K_valve*V^2/(2*g)", "", ""},
    shape{F, "hydrostatic", "hydrostatic {a}-{b}", "p_{b} = p_{a} + ρ*g*(z_{a} - z_{b})",
          "p_{b} = p_{a} + ρ*(z_{a} - z_{b})", sum},
    shape{F, "hydrostatic", "gate force", "F_h = γ*h_c*A", "", ""},
    shape{F, "manometer", "differential manometer", "Δp = (ρ_m - ρ_w)*g*Δz", "", ""},
    shape{F, "drag", "drag", "F_D = C_D*ρ_a*V^2*A/2", "F_D = C_D*ρ_a*V*A/2", side},
    shape{F, "drag", "drag", "F_D = 0.5·C_D·ρ·V^2·A", "", ""},
    shape{F, "acoustic", "speed of sound", "c = sqrt(K_v/ρ)", "c = sqrt(K_v*ρ)", side},
    shape{F, "acoustic", "compressibility", "β = 1/K_v", "", ""},
    shape{F, "acoustic", "Mach number", "Ma = V/c", "", ""},
    shape{F, "surge", "Joukowsky surge", "Δp = ρ*c*ΔV", "Δp = ρ*c*ΔV*V", side},
    shape{F, "shear", "Newtonian shear", "τ = μ*deriv(u, y)", "τ = μ*deriv(u, y, 2)", side},
    shape{F, "shear", "wall shear", "τ_w = f*ρ*V^2/8", "", ""},
    shape{F, "shear", "wall shear from drop", "τ_w = Δp*D/(4*L)", "", ""},
    shape{F, "channel", "Froude number", "Fr = V/sqrt(g*y)", "Fr = V/sqrt(g)", side},
    shape{F, "channel", "Weber number", "We = ρ*V^2*L/σ_st", "", ""},
    shape{F, "npsh", "NPSH available", "h_1 = (p_atm - p_v)/(ρ_w*g) - z_{a} - h_f", "", ""},
    shape{F, "drain", "tank drain time", "t = integral(A/(C_d*A_o*sqrt(2*g*y)), y, h_2, h_1)",
          "", ""},
    shape{F, "channel", "discharge by integration", "Q = integral(u*b_c, y, h_2, h_1)", "", ""},
    shape{F, "channel", "specific energy", "H = y + V^2/(2*g)", "H = y + V^2/2", sum},
    shape{F, "channel", "specific energy, rectangular", "H = y + Q^2/(2*g*(b_c*y)^2)", "", ""},
    shape{F, "limit", "peak drop", "abs(Δp) <= Δp_max", "", ""},
    shape{F, "limit", "peak velocity", "max(V_1, V_2, V_3) <= V_max",
          "max(V_1, Q_2) <= V_max", args},
    shape{F, "scale", "pipe size", "D = cbrt(4*Vol/π)", "", ""},

    // heat transfer
    shape{H, "cyl", "conduction through a pipe wall",
          "q = 2*π*k*L*(T_1 - T_2)/ln(r_o/r_i)", "q = 2*π*k*L*(T_1 - T_2)/ln(r_o)", arg},
    shape{H, "cyl", "insulated run", "q = 2*pi*k_w*L_c*(T_{a} - T_{b})/ln(r_2/r_1)", "", ""},
    shape{H, "cyl", "cylinder resistance", "R_cond = ln(r_o/r_i)/(2*π*k*L)", "", ""},
    shape{H, "wall", "plane wall", "q = k*A_s*(T_1 - T_2)/L_w", "", ""},
    shape{H, "fourier", "Fourier's law", "q_flux = -k*deriv(T, x)", "q_flux = -k*deriv(T, x, 2)",
          side},
    shape{H, "conv", "Newton cooling", "q = h*A_s*(T_s - T_inf)", "q = h*(T_s - T_inf)", side},
    shape{H, "rad", "radiation exchange", "q = ε_r*σ_SB*A_s*(T_s^4 - T_sur^4)",
          "q = ε_r*σ_SB*A_s*(T_s^4 - T_sur^3)", sum},
    shape{H, "overall", "overall coefficient, thin wall",
          "1/(U*A_s) = 1/(h_i*A_s) + L_w/(k_w*A_s) + 1/(h_o*A_s)",
          "1/(U*A_s) = 1/(h_i*A_s) + L_w/k_w + 1/(h_o*A_s)", sum},
    shape{H, "overall", "series resistances", "R_th = R_conv + R_cond + 1/(h_o*A_s)", "", ""},
    shape{H, "lmtd", "log-mean temperature difference", "ΔT_lm = (ΔT_1 - ΔT_2)/ln(ΔT_1/ΔT_2)",
          "ΔT_lm = (ΔT_1 - ΔT_2)/ln(ΔT_1)", arg},
    shape{H, "lmtd", "exchanger duty", "q = U*A_s*ΔT_lm", "", ""},
    shape{H, "balance", "stream energy balance", "q = m_dot*c_p*(T_out - T_in)",
          "q = m_dot*c_p*(T_out - T_in)*t", side},
    shape{H, "balance", "sensible heat", "Q_heat = m*c_p*ΔT", "", ""},
    shape{H, "balance", "heat over a period", "Q_heat = integral(q, t, t_1, t_2)", "", ""},
    shape{H, "nusselt", "Nusselt number", "Nu = h*D/k_f", "Nu = h*D/μ", side},
    shape{H, "nusselt", "Dittus–Boelter", "Nu = 0.023*Re^0.8*Pr^0.4", "", ""},
    shape{H, "nusselt", "Prandtl number", "Pr = μ*c_p/k_f", "Pr = ν*c_p/k_f", side},
    shape{H, "transient", "Biot number", "Bi = h*L_c/k", "", ""},
    shape{H, "transient", "thermal diffusivity", "α = k/(ρ*c_p)", "", ""},
    shape{H, "transient", "Fourier number", "Fo = α*t/L_c^2", "", ""},
    shape{H, "transient", "lumped capacitance",
          "(T - T_inf)/(T_i - T_inf) = exp(-h*A_s*t/(ρ*c_p*Vol))",
          "(T - T_inf)/(T_i - T_inf) = exp(-h*A_s/(ρ*c_p*Vol))", arg},
    shape{H, "fin", "fin parameter", "m_fin = sqrt(h*P_fin/(k*A_cf))", "", ""},
    shape{H, "fin", "fin heat rate", "q = sqrt(h*P_fin*k*A_cf)*θ_b*tanh(m_fin*L_fin)",
          "q = sqrt(h*P_fin*k*A_cf)*θ_b*tanh(m_fin)", arg},
    shape{H, "gen", "generation balance", "q_gen*Vol = h*A_s*(T_s - T_inf)", "", ""},
    shape{H, "gen", "slab with generation", "T_{a} - T_s = q_gen*L_w^2/(2*k)", "", ""},
    shape{H, "natconv", "Grashof number", "Gr = g*β_T*(T_s - T_inf)*L_c^3/ν^2", "", ""},
    shape{H, "work", "boundary work", "W_b = integral(p, Vol, Vol_1, Vol_2)", "", ""},
    shape{H, "limit", "surface below limit", "T_s <= T_{a}", "T_s <= q", side},
    shape{H, "limit", "ambient", "T_amb ≤ T_amb_max", "", ""},
    shape{H, "limit", "lumped model valid", "Bi < 0.1", "", ""},
    shape{H, "limit", "inside the wall", "0 <= x <= L_w", "", ""},
    shape{H, "limit", "coldest face", "min(T_1, T_2) >= T_inf", "", ""},
    shape{H, "limit", "positive driving force", "ΔT_lm > 0", "", ""},

    // structures
    shape{S, "flexure", "bending stress", "σ = M_b*y_c/I_z", "σ = M_b/I_z", side},
    shape{S, "flexure", "section modulus", "σ = M_b/S_x", "", ""},
    shape{S, "combined", "axial plus bending", "σ_max = P/A_c + M_b*y_c/I_z", "", ""},
    shape{S, "combined", "biaxial bending",
          "σ_max = P/A_c + M_b*y_c/I_z + M_y*x_c/I_y", "σ_max = P/A_c + M_b/I_z + M_y*x_c/I_y",
          sum},
    shape{S, "deflection", "simply supported, uniform load", "δ = 5*w*L_b^4/(384*E*I_z)",
          "δ = 5*w*L_b^3/(384*E*I_z)", side},
    shape{S, "deflection", "simply supported, central load", "δ = P*L_b^3/(48*E*I_z)", "", ""},
    shape{S, "moment", "uniform load moment", "M_b = w*L_b^2/8", "M_b = w*L_b/8", side},
    shape{S, "moment", "central load moment", "M_b = P*L_b/4", "", ""},
    shape{S, "euler", "Euler buckling", "P_cr = π^2*E*I_z/(K_e*L_b)^2", "", ""},
    shape{S, "euler", "slenderness", "λ = K_e*L_b/r_g", "", ""},
    shape{S, "euler", "radius of gyration", "r_g = sqrt(I_z/A_c)", "r_g = sqrt(I_z)/A_c", side},
    shape{S, "shear", "shear flow", "τ_s = V_s*Q_s/(I_z*b)", "", ""},
    shape{S, "shear", "rectangular section, peak", "τ_s = 1.5*V_s/A_c", "", ""},
    shape{S, "hooke", "Hooke's law", "σ = E*ε_s", "", ""},
    shape{S, "hooke", "shear modulus", "G = E/(2*(1 + ν_p))", "", ""},
    shape{S, "hooke", "strain", "ε_s = δ/L_b", "", ""},
    shape{S, "hooke", "thermal strain", "ε_s = α_T*ΔT", "ε_s = α_T", side},
    shape{S, "vm", "von Mises",
          "σ_vm = sqrt(σ_x^2 - σ_x*σ_y + σ_y^2 + 3*τ_xy^2)",
          "σ_vm = sqrt(σ_x^2 - σ_x*σ_y + σ_y^2 + 3*τ_xy)", sum},
    shape{S, "mohr", "principal stress", "σ_1 = (σ_x + σ_y)/2 + sqrt(((σ_x - σ_y)/2)^2 + τ_xy^2)",
          "", ""},
    shape{S, "mohr", "peak principal", "σ_max = max(σ_1, σ_2, σ_3)", "σ_max = max(σ_1, σ_2, M_b)",
          args},
    shape{S, "mohr", "maximum shear", "τ_s = hypot((σ_x - σ_y)/2, τ_xy)", "", ""},
    shape{S, "vessel", "hoop stress", "σ_h = p*r/t_w", "", ""},
    shape{S, "vessel", "hoop stress at station {a}", "σ_h = p_{a}*D/(2*t_w)", "", ""},
    shape{S, "dyn", "natural frequency", "ω_n = sqrt(k_s/m_s)", "ω_n = sqrt(k_s*m_s)", side},
    shape{S, "dyn", "cycles per second", "f_n = ω_n/(2*π)", "", ""},
    shape{S, "limit", "stress check", "σ <= φ*f_y", "σ <= φ*M_b", side},
    shape{S, "limit", "deflection limit", "δ <= L_b/360", "", ""},
    shape{S, "limit", "slenderness limit", "λ < 200", "", ""},
    shape{S, "limit", "serviceability", "δ_max <= L_b/240", "", ""},
    shape{S, "limit", "shear check", "τ_s ≤ 0.6*f_y", "", ""},
    shape{S, "limit", "concrete stress", "σ <= 0.45*f_c'", "", ""},
    shape{S, "limit", "plastic moment", "M_b <= φ*f_y*Z_x", "", ""},
    shape{S, "rotation", "end rotation", "θ = w*L_b^3/(24*E*I_z)", "", ""},
    shape{S, "rotation", "chord rotation", "θ = atan2(δ, L_b)", "θ = atan2(δ, w)", args},
    shape{S, "axial", "axial shortening", "δ = P*L_b/(A_c*E)", "", ""},
    shape{S, "limit", "web thickness", "0 < t_w <= b", "", ""},
};
// clang-format on

constexpr std::array<std::string_view, 14> coefficients = {
    "0.5",  "0.9", "1.15", "2.5", "0.025", "1.5e-3", "3.2E2",
    "0.75", "4",   "12",   "0.3", "1.8",   "6.0",    "0.08"};

constexpr std::array<std::string_view, 12> section_comments = {
    "# --- pump station P-{n}: suction side ----------------------------------",
    "# check against the design basis, rev. {n}",
    "# Δp across the strainer: vendor curve, clean condition",
    "# line {n}: carbon steel, schedule 40",
    "# values from the site survey; see sketch {n}",
    "# ---- loads case {n} -----------------------------------------------------",
    "# exchanger E-{n}: shell side",
    "# stresses in Pa; every symbol in coherent SI units",
    "# assumptions: steady, incompressible, fully developed",
    "# ρ and μ at 15 °C",
    "# member M{n}: simply supported, lateral restraint at thirds",
    "#",
};

std::string substitute(std::string_view pattern, rng& r) {
    const std::size_t a = 1 + r.below(3);
    const std::size_t b = 1 + (a + r.below(2)) % 3; // never equal to a
    const std::string_view c = coefficients[r.below(coefficients.size())];
    std::string out;
    out.reserve(pattern.size() + 8);
    for (std::size_t i = 0; i < pattern.size(); ++i) {
        if (pattern[i] == '{' && i + 2 < pattern.size() && pattern[i + 2] == '}') {
            switch (pattern[i + 1]) {
            case 'a':
                out += static_cast<char>('0' + a);
                break;
            case 'b':
                out += static_cast<char>('0' + b);
                break;
            case 'c':
                out += c;
                break;
            case 'n':
                out += fmt::format("{}", 1 + r.below(40));
                break;
            default:
                throw std::logic_error("unknown placeholder in a formula shape");
            }
            i += 2;
        } else {
            out += pattern[i];
        }
    }
    return out;
}

// Where to break a long formula over two lines: just after its first relation.
std::size_t continuation_point(std::string_view formula) {
    const std::size_t at = formula.find_first_of("=<>\xe2"); // \xe2 starts ≤ and ≥
    if (at == std::string_view::npos)
        return std::string_view::npos;
    std::size_t end = at + 1;
    if (static_cast<unsigned char>(formula[at]) == 0xe2)
        end = at + 3;
    else if (end < formula.size() && formula[end] == '=')
        ++end;
    return end;
}

class file_writer {
  public:
    explicit file_writer(const std::filesystem::path& path) : path_(path), out_(path) {
        if (!out_)
            throw std::runtime_error("cannot create " + path.string());
    }
    void line(std::string_view text) {
        out_ << text << '\n';
        bytes_ += text.size() + 1;
        ++lines_;
    }
    [[nodiscard]] std::uint32_t next_line() const { return lines_ + 1; }
    std::size_t close() {
        out_.close();
        if (!out_)
            throw std::runtime_error("cannot write " + path_.string());
        return bytes_;
    }

  private:
    std::filesystem::path path_;
    std::ofstream out_;
    std::size_t bytes_ = 0;
    std::uint32_t lines_ = 0;
};

std::size_t count_dictionary_symbols() {
    std::size_t n = 0;
    std::size_t pos = 0;
    while (pos < dictionary_text.size()) {
        std::size_t end = dictionary_text.find('\n', pos);
        if (end == std::string_view::npos)
            end = dictionary_text.size();
        const std::string_view line = dictionary_text.substr(pos, end - pos);
        const std::size_t colon = line.find(" :");
        if (!line.empty() && line[0] != '#' && colon != std::string_view::npos) {
            ++n;
            for (std::size_t i = 0; i < colon; ++i)
                n += line[i] == ',' ? 1 : 0;
        }
        pos = end + 1;
    }
    return n;
}

// Two symbols declared in the calc file itself, as engineers do for one-off quantities; each
// is used at once so that neither is reported as unused.
constexpr std::array<std::array<std::string_view, 4>, 3> local_symbols = {{
    {"L_run : m \"pipe run, this calc\"", "h_f = f*(L_run/D)*V^2/(2*g)",
     "K_fit : [1] \"sum of fitting coefficients\"", "h_m = K_fit*V^2/(2*g)"},
    {"t_ins : m \"insulation thickness\"", "R_cond = t_ins/(k*A_s)",
     "h_rad : W/(m^2*K) \"linearised radiation coefficient\"", "q = (h + h_rad)*A_s*(T_s - T_inf)"},
    {"L_cant : m \"cantilever length\"", "δ = P*L_cant^3/(3*E*I_z)",
     "n_bolts : 1 \"bolts in the splice\"", "V_s <= n_bolts*φ*f_u*A_c"},
}};

} // namespace

corpus_summary write_corpus(const std::filesystem::path& dir, std::size_t equations,
                            std::uint64_t start) {
    corpus_summary summary;
    rng r(start);

    {
        file_writer dict(dir / "dictionary.plumb");
        std::size_t pos = 0;
        while (pos < dictionary_text.size()) {
            std::size_t end = dictionary_text.find('\n', pos);
            if (end == std::string_view::npos)
                end = dictionary_text.size();
            dict.line(dictionary_text.substr(pos, end - pos));
            pos = end + 1;
        }
        summary.bytes += dict.close();
        summary.files = 1;
        summary.dictionary_symbols = count_dictionary_symbols();
    }

    for (auto d : discipline_dir)
        std::filesystem::create_directories(dir / d);

    std::vector<std::size_t> broken_shapes;
    for (std::size_t i = 0; i < shapes.size(); ++i)
        if (!shapes[i].broken.empty())
            broken_shapes.push_back(i);

    const std::size_t file_count = std::min<std::size_t>(100, equations);
    for (std::size_t fi = 0; fi < file_count; ++fi) {
        const std::size_t quota = equations / file_count + (fi < equations % file_count ? 1 : 0);
        const auto area = static_cast<discipline>(fi % 3);
        const std::string rel = fmt::format("{}/calc-{:03}.plumb", discipline_dir[fi % 3], fi + 1);
        file_writer out(dir / rel);

        out.line(fmt::format("# {}: {} calculations, sheet {} of {}", rel, discipline_dir[fi % 3],
                             fi + 1, file_count));
        out.line("use \"../dictionary.plumb\"");
        out.line("");

        std::size_t written = 0;
        if (quota >= 2) {
            const auto& local = local_symbols[fi % 3];
            out.line(local[0]);
            out.line(local[2]);
            out.line(local[1]);
            out.line(local[3]);
            written = 2;
        }

        std::size_t label_number = 0;
        for (; written < quota; ++written) {
            if (r.per_mille(45)) {
                out.line("");
                out.line(substitute(section_comments[r.below(section_comments.size())], r));
            }

            const bool plant = r.per_mille(10);
            const shape* s = nullptr;
            if (plant) {
                s = &shapes[broken_shapes[r.below(broken_shapes.size())]];
            } else {
                do {
                    s = &shapes[r.below(shapes.size())];
                } while (s->area != area && !r.per_mille(150));
            }
            std::string formula = substitute(plant ? s->broken : s->text, r);

            std::string label;
            if (r.per_mille(250)) {
                ++label_number;
                label = r.per_mille(500) ? fmt::format("@eq-{}.{} ", fi + 1, label_number)
                                         : fmt::format("@{}-{} ", s->tag, label_number);
            }
            const std::uint32_t first = out.next_line();
            const std::size_t split = formula.size() > 40 && r.per_mille(60)
                                          ? continuation_point(formula)
                                          : std::string_view::npos;
            if (split != std::string_view::npos) {
                out.line(label + formula.substr(0, split) + " \\");
                out.line("    " + formula.substr(split + (formula[split] == ' ' ? 1 : 0)));
            } else if (r.per_mille(100)) {
                out.line(fmt::format("{}{}    # {}", label, formula, substitute(s->note, r)));
            } else {
                out.line(label + formula);
            }
            if (plant)
                summary.planted.push_back({rel, first, out.next_line() - 1, s->rule});
        }
        summary.bytes += out.close();
        summary.equations += written;
        ++summary.files;
    }
    return summary;
}

void write_small_file(const std::filesystem::path& file, small_file_variant variant) {
    file_writer out(file);
    for (std::string_view line : {
             "# pump sizing, quick check",
             "ρ : kg/m^3",
             "μ : Pa*s",
             "g : m/s^2",
             "V, V_max : m/s",
             "D, L, h_f, h_p : m",
             "Q : m^3/s",
             "A : m^2",
             "P : W",
             "f, Re, η : 1",
             "Re = ρ*V*D/μ",
             "Re > 4000",
             "A = π*D^2/4",
             "Q = A*V",
             "h_f = f*(L/D)*V^2/(2*g)",
             "1/sqrt(f) = -1.8*log10(6.9/Re)",
             "h_p = h_f + V^2/(2*g)",
             "V <= V_max",
             "0 < η <= 1",
         })
        out.line(line);
    // The typo names a head never declared: the checker's error path, which throws and unwinds.
    out.line(variant == small_file_variant::with_typo ? "P = ρ*g*Q*H_p/η" : "P = ρ*g*Q*h_p/η");
    out.close();
}

} // namespace plumb_bench
