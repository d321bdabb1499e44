// The empirical distribution-factor equations of AASHTO LRFD 4.6.2.2 for a
// concrete deck on steel or concrete beams (cross-section types a, e, k), in
// the US units the equations are written in. Results are lanes per girder
// with multiple presence already inside (LRFD C4.6.2.2.2). Callers convert
// from the internal SI units at the point of use.
#pragma once

#include <string>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::distribution {

struct LrfdEquationInputs {
  Real spacing_ft = 0;    // S, girder spacing
  Real span_ft = 0;       // L, per LRFD Table C4.6.2.2.1-1 for the effect
  Real slab_in = 0;       // ts, structural deck depth
  Real kg_in4 = 0;        // Kg = n (I + A eg^2)
  int girders = 0;        // Nb
  Real curb_ft = 0;       // de, exterior web to the barrier face (exterior girders)
  Real skew_degrees = 0;  // theta
};

// LRFD Table 4.6.2.2.2b-1.
[[nodiscard]] Real interior_moment_one_lane(const LrfdEquationInputs& in);
[[nodiscard]] Real interior_moment_multi_lane(const LrfdEquationInputs& in);
// LRFD Table 4.6.2.2.3a-1.
[[nodiscard]] Real interior_shear_one_lane(const LrfdEquationInputs& in);
[[nodiscard]] Real interior_shear_multi_lane(const LrfdEquationInputs& in);
// LRFD Table 4.6.2.2.2d-1: e = 0.77 + de/9.1.
[[nodiscard]] Real exterior_moment_correction(const LrfdEquationInputs& in);
// LRFD Table 4.6.2.2.3b-1: e = 0.6 + de/10.
[[nodiscard]] Real exterior_shear_correction(const LrfdEquationInputs& in);

// LRFD Table 4.6.2.2.2e-1: c1 (0 below 30 degrees, theta capped at 60).
[[nodiscard]] Real skew_moment_c1(const LrfdEquationInputs& in);
// 1 - c1 (tan theta)^1.5, the moment reduction.
[[nodiscard]] Real skew_moment_factor(const LrfdEquationInputs& in);
// LRFD Table 4.6.2.2.3c-1: 1 + 0.20 (12 L ts^3 / Kg)^0.3 tan theta, theta
// capped at 60 degrees.
[[nodiscard]] Real skew_shear_factor(const LrfdEquationInputs& in);

// One message per parameter outside the range of applicability of the
// equations (LRFD Tables 4.6.2.2.2b-1 and 4.6.2.2.3a-1; from memory, see
// REFERENCE.md §2): S, ts, L, Kg, and de when `exterior`. Nb is left to the
// caller (Nb = 3 has its own rule). Empty when all are inside.
[[nodiscard]] std::vector<std::string> outside_range(const LrfdEquationInputs& in, bool exterior);

}  // namespace tenthpoint::distribution
