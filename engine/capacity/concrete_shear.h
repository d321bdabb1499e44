// Nominal and factored shear resistance of a concrete web with vertical
// stirrups, AASHTO LRFD 5.7.3.3: Vn = min(Vc + Vs + Vp, 0.25 f'c bv dv + Vp),
// Vc = 0.0316 beta lambda sqrt(f'c) bv dv (ksi, in), Vs = Av fy dv cot(theta)
// / s, with beta and theta from
//  - the simplified procedure, 5.7.3.4.1: beta = 2.0, theta = 45 degrees; or
//  - the general procedure, 5.7.3.4.2, from the factored demand at the
//    section (the rating passes Mu, Vu): eps_s by 5.7.3.4.2-4, beta by -1
//    (at least the minimum transverse reinforcement of 5.7.2.5) or -2 (less),
//    theta by -3.
// The shear depth dv (5.7.2.8) comes from the flexural calculation for the
// side in tension (concrete_flexure.h).
//
// Vp, the vertical component of the prestress, is 0: the model holds only
// straight strands (no draped or harped profile).
//
// Units internal SI; demand moment N*m (signed: the sign chose the tension
// side), shears and axial forces N, stresses Pa.
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "engine/capacity/resistance.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

enum class ConcreteShearMethod { simplified, general };

[[nodiscard]] std::string_view to_string(ConcreteShearMethod method);

// The factored demand at the section, as the rating computes it.
struct ShearDemand {
  Real moment = 0;  // Mu, N*m, signed: positive sags
  Real shear = 0;   // Vu, N (its magnitude is used)
  Real axial = 0;   // Nu, N, tension positive
};

struct ConcreteShearSection {
  std::string label;                    // names the section in messages
  Real web_width = 0;                   // bv, m
  Real height = 0;                      // h, m (for the 16 in limit of 5.7.3.4.1)
  Real concrete_strength = 0;           // f'c of the web, Pa
  Real density_factor = 1.0;            // lambda, LRFD 5.4.2.8 (1.0 normal weight)
  std::optional<Real> stirrup_area;     // Av, m^2 per set
  std::optional<Real> stirrup_spacing;  // s, m
  Real stirrup_yield = 0;               // fy of the stirrups, Pa (needed with stirrups)
  bool prestressed = false;
  // Steel on the flexural tension side, for eps_s of the general procedure.
  Real bar_area = 0;                 // As, m^2
  Real bar_modulus = 0;              // Es, Pa
  Real strand_area = 0;              // Aps, m^2
  Real strand_modulus = 0;           // Ep, Pa
  Real strand_tensile_strength = 0;  // fpu, Pa; fpo = 0.7 fpu (5.7.3.4.2)
};

// Preconditions: web_width, height, f'c, shear_depth and aggregate_size
// positive. The general procedure without a demand, or without steel on the
// tension side, gives an unavailable resistance naming the section.
[[nodiscard]] Resistance concrete_shear(const ConcreteShearSection& section, Real shear_depth,
                                        const std::optional<ShearDemand>& demand, ConcreteShearMethod method,
                                        Real aggregate_size, const ResistanceFactors& factors);

}  // namespace tenthpoint::capacity
