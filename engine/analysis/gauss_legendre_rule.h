// GaussLegendreRule: the n-point Gauss-Legendre quadrature on [-1, 1], which
// integrates polynomials of degree 2n - 1 exactly. Used to integrate 1/EI(x)
// (with the weights x^0, x^1, x^2) over non-prismatic beam elements.
#pragma once

#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

class GaussLegendreRule {
 public:
  // Precondition (asserted): 1 <= points <= 64.
  explicit GaussLegendreRule(int points);

  [[nodiscard]] int size() const noexcept { return static_cast<int>(nodes_.size()); }
  // Abscissae in (-1, 1), ascending, and their weights (summing to 2).
  [[nodiscard]] const std::vector<Real>& nodes() const noexcept { return nodes_; }
  [[nodiscard]] const std::vector<Real>& weights() const noexcept { return weights_; }

  // Integral of f over [a, b].
  template <typename F>
  [[nodiscard]] Real integrate(F&& f, Real a, Real b) const {
    const Real half = 0.5 * (b - a);
    const Real mid = 0.5 * (a + b);
    Real sum = 0;
    for (std::size_t i = 0; i < nodes_.size(); ++i) sum += weights_[i] * f(mid + half * nodes_[i]);
    return half * sum;
  }

 private:
  std::vector<Real> nodes_;
  std::vector<Real> weights_;
};

}  // namespace tenthpoint::analysis
