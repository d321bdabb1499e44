// Flexural resistance of a steel I-girder whose compression flange is
// discretely braced, by the flange-stress provisions of AASHTO LRFD 6.10.8
// (Appendix A6 is not used): composite girders in negative flexure and
// non-composite girders in either sense. Homogeneous girders (Rh = 1.0),
// lateral flange bending fl = 0.
//
// Compression flange, the lesser of
//  - local buckling (6.10.8.2.2): lambda_f = bfc / (2 tfc);
//    lambda_f <= lambda_pf = 0.38 sqrt(E / Fyc): Fnc = Rb Rh Fyc (-1);
//    otherwise Fnc = [1 - (1 - Fyr / (Rh Fyc)) (lambda_f - lambda_pf) /
//    (lambda_rf - lambda_pf)] Rb Rh Fyc (-2), lambda_rf = 0.56 sqrt(E / Fyr).
//    LRFD gives nothing beyond lambda_rf (its proportion limit bf / 2tf <= 12,
//    6.10.2.2-1, keeps new flanges out of that range); for an existing
//    slender flange Fnc is the lesser of (-2) and the elastic local
//    buckling stress 0.9 E kc / lambda_f^2 Rb of AISC 360-16 Eq. F3-2, kc =
//    4 / sqrt(D / tw) in [0.35, 0.76];
//  - lateral-torsional buckling (6.10.8.2.3) over the unbraced length Lb:
//    Lb <= Lp = 1.0 rt sqrt(E / Fyc): Fnc = Rb Rh Fyc (-1);
//    Lp < Lb <= Lr = pi rt sqrt(E / Fyr): Fnc = Cb [1 - (1 - Fyr / (Rh Fyc))
//    (Lb - Lp) / (Lr - Lp)] Rb Rh Fyc <= Rb Rh Fyc (-2);
//    Lb > Lr: Fnc = Fcr = Cb Rb pi^2 E / (Lb / rt)^2 <= Rb Rh Fyc (-3, -8);
//    rt = bfc / sqrt(12 (1 + Dc tw / (3 bfc tfc))) (-9).
//    Cb is the caller's (1.0 is conservative; 6.10.8.2.3-7 is not
//    implemented here because it needs the flange stresses at the brace
//    points);
// with Fyr = min(0.7 Fyc, Fyw) >= 0.5 Fyc and Rb by 6.10.1.10.2.
// Tension flange: Fnt = Rh Fyt (6.10.8.3-1).
//
// A cover plate on the compression side is merged with its flange into one
// plate of the flange's width and the combined area (common practice for
// bolted or riveted cover plates; stated in the trace).
//
// The moment equivalent is min(Fnc S_c, Fnt S_t) with the live-load
// section's moduli at the two extreme fibres; the flange-stress form in the
// result is what a rating should use. Units internal SI.
#pragma once

#include <optional>
#include <string>

#include "engine/capacity/resistance.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/capacity/stage_moduli.h"
#include "engine/model/section.h"

namespace tenthpoint::capacity {

struct SteelFlangeFlexureInput {
  std::string label;  // names the section and sign in messages
  model::SteelIGirder girder;
  Real steel_yield = 0;               // Fy of flanges and web, Pa
  Real steel_modulus = 0;             // E, Pa
  bool compression_on_top = false;    // true: positive moment of a non-composite girder
  Real unbraced_length = 0;           // Lb, m
  Real moment_gradient_factor = 1.0;  // Cb
  Real web_compression_depth = 0;     // Dc, m, elastic (D6.3.1)
  // Extreme-fibre section moduli of the live-load section at the compression
  // and tension flanges, m^3, for the moment equivalent.
  std::optional<Real> compression_modulus;
  std::optional<Real> tension_modulus;
  StageModuli moduli;  // carried into the flange-stress form
};

struct SteelFlangeFlexure {
  Resistance resistance;
  Real local_buckling_stress = 0;     // Fnc by 6.10.8.2.2, Pa
  Real lateral_torsional_stress = 0;  // Fnc by 6.10.8.2.3, Pa
  Real load_shedding = 1.0;           // Rb
};

// Preconditions: positive plates, Fy, E and Lb; Cb >= 1; Dc >= 0.
[[nodiscard]] SteelFlangeFlexure steel_flange_flexure(const SteelFlangeFlexureInput& input,
                                                      const ResistanceFactors& factors);

}  // namespace tenthpoint::capacity
