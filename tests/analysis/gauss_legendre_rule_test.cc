#include "engine/analysis/gauss_legendre_rule.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

TEST_CASE("Gauss-Legendre nodes and weights match the tabulated values", "[analysis][quadrature]") {
  // Two points: +-1/sqrt(3), weights 1 (closed form). Five points (Abramowitz &
  // Stegun, Table 25.4; digits from memory, and the exactness check below does
  // not depend on them): 0.906179845938664 / 0.236926885056189,
  // 0.538469310105683 / 0.478628670499366, 0 / 0.568888888888889 (= 128/225).
  const GaussLegendreRule two(2);
  TP_CHECK_CLOSE(two.nodes()[1], 1.0 / std::sqrt(3.0), 1e-15, 1.0);
  TP_CHECK_CLOSE(two.weights()[0], 1.0, 1e-15, 1.0);
  const GaussLegendreRule five(5);
  TP_CHECK_CLOSE(five.nodes()[4], 0.906179845938664, 1e-14, 1.0);
  TP_CHECK_CLOSE(five.weights()[4], 0.236926885056189, 1e-14, 1.0);
  TP_CHECK_CLOSE(five.nodes()[3], 0.538469310105683, 1e-14, 1.0);
  TP_CHECK_CLOSE(five.weights()[3], 0.478628670499366, 1e-14, 1.0);
  TP_CHECK_CLOSE(five.nodes()[2], 0.0, 1e-15, 1.0);
  TP_CHECK_CLOSE(five.weights()[2], 128.0 / 225.0, 1e-14, 1.0);
}

TEST_CASE("an n-point rule integrates every polynomial of degree 2n - 1 exactly", "[analysis][quadrature]") {
  // Defining property of Gauss-Legendre quadrature: int_a^b x^k dx exact for k <= 2n - 1.
  for (int n : {1, 3, 8, 16, 33}) {
    const GaussLegendreRule rule(n);
    Real weight_sum = 0;
    for (Real w : rule.weights()) weight_sum += w;
    TP_CHECK_CLOSE(weight_sum, 2.0, 1e-14, 1.0);
    for (int k = 0; k <= 2 * n - 1; ++k) {
      const Real a = 0.5;
      const Real b = 2.0;
      const Real exact = (std::pow(b, k + 1) - std::pow(a, k + 1)) / (k + 1);
      INFO("n = " << n << ", k = " << k);
      TP_CHECK_CLOSE(rule.integrate([k](Real x) { return std::pow(x, k); }, a, b), exact, 1e-12, 1.0);
    }
  }
}
