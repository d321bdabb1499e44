#include "engine/analysis/beam_element.h"

#include <algorithm>
#include <cassert>
#include <limits>

namespace tenthpoint::analysis {

ElementMatrix prismatic_beam_stiffness(Real ei, Real length) {
  assert(ei > 0.0 && length > 0.0);
  const Real l = length;
  const Real a = 12.0 * ei / (l * l * l);
  const Real b = 6.0 * ei / (l * l);
  const Real c = 4.0 * ei / l;
  const Real d = 2.0 * ei / l;
  ElementMatrix k;
  k << a, b, -a, b,   //
      b, c, -b, d,    //
      -a, -b, a, -b,  //
      b, d, -b, c;
  return k;
}

ElementMatrix flexibility_beam_stiffness(const std::function<Real(Real)>& ei, Real start, Real end,
                                         const GaussLegendreRule& rule, Real* smallest_ei) {
  assert(end > start);
  const Real l = end - start;
  // Cantilever clamped at node 1, loaded at node 2 by an upward force Q and a
  // counterclockwise moment m. The sagging moment at s = x / l is
  // M = Q l (1 - s) + m, the curvature M / EI, and by virtual work
  //   v2 = int (l - x)^2 / EI dx Q + int (l - x) / EI dx m,
  //   theta2 = int (l - x) / EI dx Q + int 1 / EI dx m.
  // The integrals are taken in s so that the rule sees an O(1) interval.
  Real f0 = 0;  // int_0^1 g ds, g = 1 / EI
  Real f1 = 0;  // int_0^1 (1 - s) g ds
  Real f2 = 0;  // int_0^1 (1 - s)^2 g ds
  Real least = std::numeric_limits<Real>::infinity();
  const auto& nodes = rule.nodes();
  const auto& weights = rule.weights();
  for (std::size_t i = 0; i < nodes.size(); ++i) {
    const Real s = 0.5 * (1.0 + nodes[i]);
    const Real value = ei(start + s * l);
    least = std::min(least, value);
    if (!(value > 0.0)) continue;
    const Real g = 0.5 * weights[i] / value;
    const Real r = 1.0 - s;
    f0 += g;
    f1 += g * r;
    f2 += g * r * r;
  }
  if (smallest_ei) *smallest_ei = least;
  if (!(least > 0.0)) return ElementMatrix::Zero();

  // Flexibility F = [l^3 f2, l^2 f1; l^2 f1, l f0]; its inverse is the
  // stiffness of the free end, K22 = F^-1 (2 x 2 closed form).
  const Real a = l * l * l * f2;
  const Real b = l * l * f1;
  const Real c = l * f0;
  const Real det = a * c - b * b;  // > 0 by Cauchy-Schwarz for EI > 0
  FixedMatrix<2, 2> k22;
  k22 << c / det, -b / det, -b / det, a / det;

  // Statics of the free body: forces at node 1 are T times those at node 2,
  // Q1 = -Q, m1 = -m - Q l, so K = [T K22 T^T, T K22; K22 T^T, K22].
  FixedMatrix<2, 2> t;
  t << -1.0, 0.0, -l, -1.0;
  ElementMatrix k;
  k.block<2, 2>(0, 0) = t * k22 * t.transpose();
  k.block<2, 2>(0, 2) = t * k22;
  k.block<2, 2>(2, 0) = k22 * t.transpose();
  k.block<2, 2>(2, 2) = k22;
  return k;
}

ElementVector hermite_shape(Real t, Real length) {
  const Real s = t / length;
  const Real s2 = s * s;
  const Real s3 = s2 * s;
  ElementVector n;
  n << 1.0 - 3.0 * s2 + 2.0 * s3, length * (s - 2.0 * s2 + s3), 3.0 * s2 - 2.0 * s3, length * (s3 - s2);
  return n;
}

ElementVector hermite_shape_integral(Real t0, Real t1, Real length) {
  // Antiderivatives in s of the shape functions, times length for dt = length ds.
  auto antiderivative = [length](Real t) {
    const Real s = t / length;
    const Real s2 = s * s;
    const Real s3 = s2 * s;
    const Real s4 = s3 * s;
    ElementVector a;
    a << s - s3 + 0.5 * s4, length * (0.5 * s2 - 2.0 * s3 / 3.0 + 0.25 * s4), s3 - 0.5 * s4,
        length * (0.25 * s4 - s3 / 3.0);
    return ElementVector(length * a);
  };
  return antiderivative(t1) - antiderivative(t0);
}

}  // namespace tenthpoint::analysis
