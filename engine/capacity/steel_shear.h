// Nominal and factored shear resistance of a steel I-girder web, AASHTO LRFD
// 6.10.9, homogeneous girders:
//  - Vp = 0.58 Fyw D tw (6.10.9.2-2);
//  - C, the ratio of the shear-buckling to the shear-yield resistance
//    (6.10.9.3.2-4, -5, -6): with r = sqrt(E k / Fyw),
//    D/tw <= 1.12 r: C = 1.0; 1.12 r < D/tw <= 1.40 r: C = 1.12 r / (D/tw);
//    D/tw > 1.40 r: C = 1.57 r^2 / (D/tw)^2;
//  - unstiffened webs (6.10.9.2): k = 5, Vn = C Vp (6.10.9.2-1);
//  - stiffened interior panels (6.10.9.3.2), transverse stiffeners at do <=
//    3 D (6.10.9.1; wider spacing is taken as unstiffened): k = 5 + 5 /
//    (do/D)^2 (6.10.9.3.2-7); Vn = Vp [C + 0.87 (1 - C) / sqrt(1 +
//    (do/D)^2)] when 2 D tw / (bfc tfc + bft tft) <= 2.5 (6.10.9.3.2-2),
//    else Vp [C + 0.87 (1 - C) / (sqrt(1 + (do/D)^2) + do/D)] (-8);
//  - end panels (6.10.9.3.3): no tension field, Vn = C Vp with k from do.
// The flange areas in the -2/-8 test are the flange plates alone (cover
// plates left out, conservative). Units internal SI.
#pragma once

#include <optional>
#include <string>

#include "engine/capacity/resistance.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

struct SteelShearInput {
  std::string label;
  Real web_depth = 0;                     // D, m
  Real web_thickness = 0;                 // tw, m
  Real web_yield = 0;                     // Fyw, Pa
  Real modulus = 0;                       // E, Pa
  std::optional<Real> stiffener_spacing;  // do, m; absent = unstiffened
  bool end_panel = false;                 // the panel next to a girder end (6.10.9.3.3)
  Real compression_flange_area = 0;       // bfc tfc, m^2
  Real tension_flange_area = 0;           // bft tft, m^2
};

// Preconditions: D, tw, Fyw, E and the flange areas positive.
[[nodiscard]] Resistance steel_shear(const SteelShearInput& input, const ResistanceFactors& factors);

}  // namespace tenthpoint::capacity
