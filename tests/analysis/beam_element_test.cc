#include "engine/analysis/beam_element.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

// Exact flexibility of a cantilever [0, L] clamped at 0 with
// EI(x) = ei0 (1 + c x), from the antiderivatives of x^k / (1 + c x):
//   I0 = ln(1 + c x) / c,  I1 = x / c - ln(1 + c x) / c^2,
//   I2 = x^2 / (2c) - x / c^2 + ln(1 + c x) / c^3   (integral tables, e.g.
//   Gradshteyn & Ryzhik 2.111).
struct LinearTaper {
  Real ei0, c, l;
  Real i0(Real x) const { return std::log1p(c * x) / c; }
  Real i1(Real x) const { return x / c - std::log1p(c * x) / (c * c); }
  Real i2(Real x) const { return x * x / (2 * c) - x / (c * c) + std::log1p(c * x) / (c * c * c); }
  // int_0^L (L - x)^k / EI dx
  Real f0() const { return i0(l) / ei0; }
  Real f1() const { return (l * i0(l) - i1(l)) / ei0; }
  Real f2() const { return (l * l * i0(l) - 2 * l * i1(l) + i2(l)) / ei0; }
};

}  // namespace

TEST_CASE("the prismatic stiffness is the textbook Hermite matrix and the flexibility route agrees",
          "[analysis][beam_element]") {
  // Przemieniecki (1968) eq. 5.58 / any matrix-analysis text: k11 = 12EI/L^3,
  // k12 = 6EI/L^2, k22 = 4EI/L, k24 = 2EI/L.
  const Real ei = 3.0e9;
  const Real l = 7.5;
  const ElementMatrix k = prismatic_beam_stiffness(ei, l);
  TP_CHECK_CLOSE(k(0, 0), 12 * ei / (l * l * l), 1e-15, 1.0);
  TP_CHECK_CLOSE(k(0, 1), 6 * ei / (l * l), 1e-15, 1.0);
  TP_CHECK_CLOSE(k(1, 1), 4 * ei / l, 1e-15, 1.0);
  TP_CHECK_CLOSE(k(1, 3), 2 * ei / l, 1e-15, 1.0);
  TP_CHECK_CLOSE(k(0, 2), -12 * ei / (l * l * l), 1e-15, 1.0);
  const GaussLegendreRule rule(4);
  Real least = 0;
  const ElementMatrix kf = flexibility_beam_stiffness([ei](Real) { return ei; }, 2.0, 2.0 + l, rule, &least);
  CHECK(least == ei);
  for (int i = 0; i < 4; ++i) {
    for (int j = 0; j < 4; ++j) TP_CHECK_CLOSE(kf(i, j), k(i, j), 1e-12, k.cwiseAbs().maxCoeff());
  }
}

TEST_CASE("a linearly tapered element has the stiffness of its exact flexibility", "[analysis][beam_element]") {
  // EI doubling along the element; reference: the closed-form flexibility
  // above, inverted (K22 = F^-1), and the rigid-body/equilibrium structure.
  const LinearTaper taper{2.0e9, 1.0 / 10.0, 10.0};
  const Real det = taper.f2() * taper.f0() - taper.f1() * taper.f1();
  const Real k33 = taper.f0() / det;   // v2, v2
  const Real k34 = -taper.f1() / det;  // v2, theta2
  const Real k44 = taper.f2() / det;   // theta2, theta2
  auto ei = [&](Real x) { return taper.ei0 * (1 + taper.c * (x - 5.0)); };
  Real least = 0;
  // 16 points: quadrature error at rounding level even over one long element.
  const ElementMatrix k = flexibility_beam_stiffness(ei, 5.0, 15.0, GaussLegendreRule(16), &least);
  TP_CHECK_CLOSE(k(2, 2), k33, 1e-13, 1.0);
  TP_CHECK_CLOSE(k(2, 3), k34, 1e-13, 1.0);
  TP_CHECK_CLOSE(k(3, 3), k44, 1e-13, 1.0);
  CHECK((least > taper.ei0 && least < 1.01 * taper.ei0));  // the first Gauss point, just inside the thin end
  // The model's default 8 points over an element this long (EI doubling in
  // one element; the model's sub-elements are far shorter) err by ~2e-11;
  // Gauss-Legendre error decays like rho^-2n (rho = 3 + sqrt 8 here).
  const ElementMatrix k8 = flexibility_beam_stiffness(ei, 5.0, 15.0, GaussLegendreRule(8), &least);
  TP_CHECK_CLOSE(k8(3, 3), k44, 1e-10, 1.0);
  // Symmetric, and rigid-body motions produce no forces.
  ElementVector translation;
  translation << 1, 0, 1, 0;
  ElementVector rotation;
  rotation << 0, 1, taper.l, 1;
  const Real scale = k.cwiseAbs().maxCoeff();
  CHECK((k - k.transpose()).cwiseAbs().maxCoeff() <= 1e-12 * scale);
  CHECK((k * translation).cwiseAbs().maxCoeff() <= 1e-12 * scale);
  CHECK((k * rotation).cwiseAbs().maxCoeff() <= 1e-11 * scale * taper.l);
}

TEST_CASE("Hermite shape functions are the exact fixed-end forces of a prismatic element", "[analysis][beam_element]") {
  // AISC Table 3-23, beam fixed at both ends, load P at a: R1 = P b^2 (3a + b)/L^3,
  // M1 = P a b^2 / L^2; uniform load: R = wL/2, M = wL^2/12.
  const Real l = 6.0;
  const Real a = 2.0;
  const Real b = l - a;
  const ElementVector n = hermite_shape(a, l);
  TP_CHECK_CLOSE(n(0), b * b * (3 * a + b) / (l * l * l), 1e-15, 1.0);
  TP_CHECK_CLOSE(n(1), a * b * b / (l * l), 1e-15, 1.0);
  TP_CHECK_CLOSE(n(3), -a * a * b / (l * l), 1e-15, 1.0);
  const ElementVector q = hermite_shape_integral(0.0, l, l);
  TP_CHECK_CLOSE(q(0), l / 2, 1e-15, 1.0);
  TP_CHECK_CLOSE(q(1), l * l / 12, 1e-15, 1.0);
  TP_CHECK_CLOSE(q(3), -l * l / 12, 1e-15, 1.0);
}
