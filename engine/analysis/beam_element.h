// BeamElement: a two-node Euler-Bernoulli (Bernoulli-Navier) beam element in
// the vertical plane, with its exact stiffness.
//
// Local degrees of freedom, in this order: (v1, theta1, v2, theta2):
//   v      vertical translation, m, positive upward;
//   theta  rotation = dv/dx, rad, positive counterclockwise (x to the right,
//          y up).
// Element end forces (acting on the element) pair with them: vertical force in
// N (positive upward) and moment in N*m (positive counterclockwise).
//
// Stiffness:
//  - prismatic: the closed form EI/L^3 [12 6L -12 6L; 6L 4L^2 -6L 2L^2; ...]
//    (e.g. Przemieniecki, Theory of Matrix Structural Analysis, 1968, eq. 5.58);
//  - non-prismatic: the inverse of the exact cantilever flexibility of the
//    element, whose entries are integrals of (L - x)^k / EI(x), k = 0, 1, 2,
//    evaluated by Gauss-Legendre quadrature, and completed to 4 x 4 by
//    statics. For EI(x) smooth over the element this is exact to the
//    quadrature error, which is at rounding level for the rule and element
//    lengths the model uses.
#pragma once

#include <functional>

#include "engine/analysis/gauss_legendre_rule.h"
#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

using ElementMatrix = FixedMatrix<4, 4>;
using ElementVector = FixedVector<4>;

struct BeamElement {
  Real start = 0;  // m, station of node 1
  Real end = 0;    // m, station of node 2
  bool prismatic = true;
  ElementMatrix stiffness = ElementMatrix::Zero();

  [[nodiscard]] Real length() const { return end - start; }
};

// Closed-form stiffness of a prismatic element. Preconditions: ei > 0, length > 0.
[[nodiscard]] ElementMatrix prismatic_beam_stiffness(Real ei, Real length);

// Stiffness of the element [start, end] with EI(x) given at stations x (m),
// from its flexibility. `smallest_ei` receives the least EI met at a
// quadrature point (the caller rejects EI <= 0). Precondition: end > start.
[[nodiscard]] ElementMatrix flexibility_beam_stiffness(const std::function<Real(Real)>& ei, Real start, Real end,
                                                       const GaussLegendreRule& rule, Real* smallest_ei);

// Cubic Hermite shape functions at distance t from node 1 (0 <= t <= length):
// the deflection of a prismatic element with unit end displacements, and also
// the consistent (and for a prismatic element exact) nodal loads of a unit
// point load at t.
[[nodiscard]] ElementVector hermite_shape(Real t, Real length);

// Exact integral of the Hermite shape functions over [t0, t1] within the element:
// the consistent nodal loads of a unit uniform load on that stretch.
[[nodiscard]] ElementVector hermite_shape_integral(Real t0, Real t1, Real length);

}  // namespace tenthpoint::analysis
