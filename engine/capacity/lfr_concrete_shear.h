// Shear strength of a reinforced concrete web for Load Factor Rating (MBE
// 6B.5), by the AASHTO Standard Specifications 17th ed. (2002), 8.16.6:
//   Vn = Vc + Vs                              (8-46)
//   Vc = 2 sqrt(f'c) bw d   (psi, in)         (8-49, the simple form)
//   Vs = Av fy d / s, at most 8 sqrt(f'c) bw d (8-53, 8.16.6.3.9)
//   phi = 0.85                                (8.16.1.2.2)
// with d the depth to the flexural tension steel. Equation numbers from
// memory of the 17th edition. Prestressed webs (9.20, Vci and Vcw) are not
// covered here. Units internal SI.
#pragma once

#include "engine/capacity/concrete_shear.h"
#include "engine/capacity/resistance.h"

namespace tenthpoint::capacity {

// Uses the section's web width, f'c, density factor (multiplies sqrt(f'c),
// common practice for lightweight concrete) and stirrups. Preconditions:
// web_width, f'c and effective_depth positive.
[[nodiscard]] Resistance lfr_concrete_shear(const ConcreteShearSection& section, Real effective_depth);

}  // namespace tenthpoint::capacity
