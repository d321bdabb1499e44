#include "engine/analysis/gauss_legendre_rule.h"

#include <cassert>
#include <cmath>
#include <limits>

#include "engine/core/units.h"

namespace tenthpoint::analysis {

// Nodes are the zeros of the Legendre polynomial P_n, found by Newton's method
// from the estimate cos(pi (i - 1/4) / (n + 1/2)); P_n and P_n' come from the
// three-term recurrence (k+1) P_{k+1} = (2k+1) x P_k - k P_{k-1} and the
// weights are 2 / ((1 - x^2) P_n'(x)^2) (Abramowitz & Stegun 25.4.29 and 22.7.10).
GaussLegendreRule::GaussLegendreRule(int points) {
  assert(points >= 1 && points <= 64);
  const int n = points;
  nodes_.assign(static_cast<std::size_t>(n), 0.0);
  weights_.assign(static_cast<std::size_t>(n), 0.0);
  const int half = (n + 1) / 2;
  for (int i = 0; i < half; ++i) {
    Real x = std::cos(units::kPi * (static_cast<Real>(i) + 0.75) / (static_cast<Real>(n) + 0.5));
    Real derivative = 1.0;
    for (int iteration = 0; iteration < 100; ++iteration) {
      Real p_previous = 1.0;
      Real p = x;
      for (int k = 1; k < n; ++k) {
        const Real p_next = ((2.0 * k + 1.0) * x * p - k * p_previous) / (k + 1.0);
        p_previous = p;
        p = p_next;
      }
      if (n == 1) p_previous = 1.0;
      derivative = static_cast<Real>(n) * (x * p - p_previous) / (x * x - 1.0);
      const Real step = p / derivative;
      x -= step;
      if (std::abs(step) <= 4.0 * std::numeric_limits<Real>::epsilon()) break;
    }
    // Re-evaluate P_n' at the converged node for the weight.
    Real p_previous = 1.0;
    Real p = x;
    for (int k = 1; k < n; ++k) {
      const Real p_next = ((2.0 * k + 1.0) * x * p - k * p_previous) / (k + 1.0);
      p_previous = p;
      p = p_next;
    }
    if (n == 1) {
      derivative = 1.0;
    } else {
      derivative = static_cast<Real>(n) * (x * p - p_previous) / (x * x - 1.0);
    }
    const Real weight = 2.0 / ((1.0 - x * x) * derivative * derivative);
    const auto lo = static_cast<std::size_t>(i);
    const auto hi = static_cast<std::size_t>(n - 1 - i);
    nodes_[lo] = -x;
    nodes_[hi] = x;
    weights_[lo] = weight;
    weights_[hi] = weight;
  }
  if (n % 2 == 1) nodes_[static_cast<std::size_t>(n / 2)] = 0.0;
}

}  // namespace tenthpoint::analysis
