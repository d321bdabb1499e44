// Small, allocation-free helpers on one cubic c0 + c1 t + c2 t^2 + c3 t^3 in
// a local coordinate t; the inner loops of the moving-load search use them
// millions of times, so they avoid std::vector and virtual calls.
#pragma once

#include <array>
#include <cmath>
#include <limits>

#include "engine/core/numeric.h"

namespace tenthpoint::live_load::detail {

using Cubic = std::array<Real, 4>;

inline Real horner(const Cubic& c, Real t) { return ((c[3] * t + c[2]) * t + c[1]) * t + c[0]; }
inline Real horner_slope(const Cubic& c, Real t) { return (3.0 * c[3] * t + 2.0 * c[2]) * t + c[1]; }

// Coefficients of the same polynomial about t = shift: q(tau) = p(shift + tau).
inline Cubic taylor_shift(const Cubic& c, Real shift) {
  const Real d = shift;
  return {horner(c, d), horner_slope(c, d), c[2] + 3.0 * c[3] * d, c[3]};
}

// Up to two zeros of a + b t + c t^2 strictly inside (0, h), ascending;
// returns how many. Cancellation-free form of the quadratic formula
// (q = -(b + sgn(b) sqrt(b^2 - 4ac)) / 2, roots q/c and a/q; Press et al.,
// Numerical Recipes, 3rd ed., 5.6). A leading coefficient that is negligible
// against the others at the scale of the interval is treated as zero, so a
// nearly linear derivative yields its one zero.
inline int quadratic_zeros_inside(Real a, Real b, Real c, Real h, Real out[2]) {
  // Normalise to s = t / h in (0, 1) so the negligibility test is scale free.
  const Real bs = b * h;
  const Real cs = c * h * h;
  const Real scale = std::abs(a) + std::abs(bs) + std::abs(cs);
  int count = 0;
  if (scale == 0.0) return 0;
  auto keep = [&](Real s) {
    if (s > 0.0 && s < 1.0 && std::isfinite(s)) out[count++] = s * h;
  };
  if (std::abs(cs) <= 1e-14 * scale) {
    if (bs != 0.0) keep(-a / bs);
    return count;
  }
  const Real discriminant = bs * bs - 4.0 * cs * a;
  if (discriminant < 0.0) return 0;
  const Real q = -0.5 * (bs + std::copysign(std::sqrt(discriminant), bs));
  keep(q / cs);
  if (q != 0.0) keep(a / q);
  if (count == 2 && out[0] > out[1]) std::swap(out[0], out[1]);
  if (count == 2 && out[0] == out[1]) count = 1;
  return count;
}

// Stationary points of the cubic strictly inside (0, h).
inline int stationary_points_inside(const Cubic& c, Real h, Real out[2]) {
  return quadratic_zeros_inside(c[1], 2.0 * c[2], 3.0 * c[3], h, out);
}

// Zeros of the cubic strictly inside (0, h) where it changes sign, ascending;
// at most three. The interval is cut at the stationary points into monotone
// parts, each holding at most one sign change, found by bracketed Newton
// steps with a bisection fallback. A zero that only touches (a double root)
// does not change the sign and is not reported: the positive and negative
// parts of the curve are unchanged by it.
int sign_changes_inside(const Cubic& c, Real h, Real out[3]);

// Largest and smallest value on the closed interval [0, h]: ends and
// stationary points.
struct CubicRange {
  Real max = 0;
  Real min = 0;
  Real argmax = 0;
  Real argmin = 0;
};
CubicRange range_on(const Cubic& c, Real h);

}  // namespace tenthpoint::live_load::detail
