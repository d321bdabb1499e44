#include "engine/analysis/piecewise_cubic.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

// Polynomial identities hold to rounding.
constexpr Real kTight = 1e-12;

// (x - r1)(x - r2)(x - r3) on [a, b] as one piece about a.
PiecewiseCubic::Coefficients cubic_with_roots(Real a, Real r1, Real r2, Real r3, Real lead = 1.0) {
  // Expand in t = x - a: (t - s1)(t - s2)(t - s3), s_i = r_i - a.
  const Real s1 = r1 - a, s2 = r2 - a, s3 = r3 - a;
  return {-lead * s1 * s2 * s3, lead * (s1 * s2 + s1 * s3 + s2 * s3), -lead * (s1 + s2 + s3), lead};
}

}  // namespace

TEST_CASE("values, limits and slopes follow the stated conventions", "[analysis][piecewise_cubic]") {
  // f = x^2 on [0, 1], 5 - x on [1, 3] (jumps from 1 to 4 at x = 1).
  PiecewiseCubic f({0.0, 1.0, 3.0}, {{0.0, 0.0, 1.0, 0.0}, {4.0, -1.0, 0.0, 0.0}});
  CHECK(f.value(0.5) == Approx(0.25));
  CHECK(f.value(1.0) == Approx(4.0));  // right-continuous
  CHECK(f.left_limit(1.0) == Approx(1.0));
  CHECK(f.right_limit(1.0) == Approx(4.0));
  CHECK(f.value(3.0) == Approx(2.0));  // left limit at the last knot
  CHECK(f.right_limit(3.0) == 0.0);    // zero beyond the domain
  CHECK(f.left_limit(0.0) == 0.0);
  CHECK(f.value(-1.0) == 0.0);
  CHECK(f.value(3.5) == 0.0);
  CHECK(f.slope(0.5) == Approx(1.0));
  CHECK(f.derivative().value(2.0) == Approx(-1.0));
}

TEST_CASE("integrals are exact and areas split at the zeros", "[analysis][piecewise_cubic]") {
  // (x - 1)(x - 2)(x - 3) on [0, 4]: its antiderivative is (x-2)^4/4 - (x-2)^2/2
  // (calculus; the cubic is symmetric about x = 2). Over [0, 4] the integral is
  // 0; positive area = int_1^2 + int_3^4 = 1/4 + 9/4.
  PiecewiseCubic f({0.0, 4.0}, {cubic_with_roots(0.0, 1.0, 2.0, 3.0)});
  auto antiderivative = [](Real x) { return std::pow(x - 2, 4) / 4 - std::pow(x - 2, 2) / 2; };
  TP_CHECK_CLOSE(f.integral(0.0, 4.0), 0.0, kTight, 1.0);
  TP_CHECK_CLOSE(f.integral(0.3, 2.7), antiderivative(2.7) - antiderivative(0.3), kTight, 1.0);
  TP_CHECK_CLOSE(f.positive_area(0.0, 4.0), 2.5, kTight, 1.0);
  TP_CHECK_CLOSE(f.negative_area(0.0, 4.0), -2.5, kTight, 1.0);
  TP_CHECK_CLOSE(f.positive_area(1.5, 3.5),
                 antiderivative(2.0) - antiderivative(1.5) + antiderivative(3.5) - antiderivative(3.0), kTight, 1.0);
  // Parts of [a, b] outside the domain add nothing.
  TP_CHECK_CLOSE(f.integral(-5.0, 9.0), 0.0, kTight, 1.0);
}

TEST_CASE("roots of cubic, quadratic, linear and vanishing pieces are found", "[analysis][piecewise_cubic]") {
  SECTION("three simple roots, one of them on a knot") {
    PiecewiseCubic f({0.0, 2.0, 4.0}, {cubic_with_roots(0.0, 1.0, 2.0, 3.0), cubic_with_roots(2.0, 1.0, 2.0, 3.0)});
    const auto r = f.roots();
    REQUIRE(r.size() == 3);
    TP_CHECK_CLOSE(r[0], 1.0, kTight, 1.0);
    TP_CHECK_CLOSE(r[1], 2.0, kTight, 1.0);
    TP_CHECK_CLOSE(r[2], 3.0, kTight, 1.0);
    // Stationary points of (x-1)(x-2)(x-3): 2 +- 1/sqrt(3) (calculus).
    const auto s = f.stationary_points();
    REQUIRE(s.size() == 2);
    TP_CHECK_CLOSE(s[0], 2.0 - 1.0 / std::sqrt(3.0), kTight, 1.0);
    TP_CHECK_CLOSE(s[1], 2.0 + 1.0 / std::sqrt(3.0), kTight, 1.0);
  }
  SECTION("clustered roots and a tiny leading coefficient") {
    // Roots 0.5, 0.5 + 1e-6, 0.9 of a cubic scaled by 1e-9: both a scale
    // and a separation test.
    PiecewiseCubic f({0.0, 1.0}, {cubic_with_roots(0.0, 0.5, 0.5 + 1e-6, 0.9, 1e-9)});
    const auto r = f.roots();
    REQUIRE(r.size() == 3);
    TP_CHECK_CLOSE(r[0], 0.5, 1e-9, 1.0);
    TP_CHECK_CLOSE(r[1], 0.5 + 1e-6, 1e-9, 1.0);
    TP_CHECK_CLOSE(r[2], 0.9, 1e-12, 1.0);
  }
  SECTION("quadratic with a double root, linear, constant and zero pieces") {
    PiecewiseCubic f({0.0, 1.0, 2.0, 3.0, 4.0}, {{0.25, -1.0, 1.0, 0.0},  // (t - 1/2)^2: double root at 0.5
                                                 {-0.5, 1.0, 0.0, 0.0},   // t - 1/2: root at 1.5
                                                 {2.0, 0.0, 0.0, 0.0},    // no root
                                                 {0.0, 0.0, 0.0, 0.0}});  // identically zero: no isolated roots
    const auto r = f.roots();
    REQUIRE(r.size() == 2);
    TP_CHECK_CLOSE(r[0], 0.5, 1e-7, 1.0);  // a double root is only defined to sqrt(eps)
    TP_CHECK_CLOSE(r[1], 1.5, kTight, 1.0);
  }
  SECTION("a large cubic coefficient with roots near the ends") {
    // 1e6 (x - 1e-7)(x - 0.5)(x - (1 - 1e-7)) on [0, 1].
    PiecewiseCubic f({0.0, 1.0}, {cubic_with_roots(0.0, 1e-7, 0.5, 1 - 1e-7, 1e6)});
    const auto r = f.roots();
    REQUIRE(r.size() == 3);
    TP_CHECK_CLOSE(r[0], 1e-7, 1e-6, 1e-7);
    TP_CHECK_CLOSE(r[2], 1 - 1e-7, kTight, 1.0);
  }
}

TEST_CASE("linear combinations re-knot curves exactly", "[analysis][piecewise_cubic]") {
  PiecewiseCubic a({0.0, 2.0, 5.0}, {{1.0, 2.0, -1.0, 0.5}, {3.0, 0.0, 1.0, -0.2}});
  PiecewiseCubic b({1.0, 3.0, 4.0, 6.0}, {{0.0, 1.0, 0.0, 0.0}, {-1.0, 0.5, 0.25, 0.0}, {2.0, -2.0, 0.0, 1.0}});
  const PiecewiseCubic c = 2.0 * a - b;
  CHECK(c.knots() == std::vector<Real>{0.0, 1.0, 2.0, 3.0, 4.0, 5.0, 6.0});
  for (int i = 0; i <= 60; ++i) {
    const Real x = 0.1 * i;
    if (x == 1.0 || x == 2.0 || x == 3.0 || x == 4.0 || x == 5.0) continue;  // jumps: sides differ
    TP_CHECK_CLOSE(c.value(x), 2.0 * a.value(x) - b.value(x), kTight, 10.0);
  }
  // Same knots: coefficients add without re-knotting.
  PiecewiseCubic twice = a;
  twice += a;
  CHECK(twice.shared_knots() == a.shared_knots());
  TP_CHECK_CLOSE(twice.value(3.3), 2.0 * a.value(3.3), kTight, 1.0);
}

TEST_CASE("Hermite pieces reproduce a cubic from its end values and slopes", "[analysis][piecewise_cubic]") {
  auto p = [](Real x) { return 2.0 - x + 0.3 * x * x - 0.07 * x * x * x; };
  auto dp = [](Real x) { return -1.0 + 0.6 * x - 0.21 * x * x; };
  const CubicPiece h = CubicPiece::hermite(1.5, 4.0, p(1.5), dp(1.5), p(4.0), dp(4.0));
  for (Real x : {1.5, 2.0, 2.7, 3.9, 4.0}) TP_CHECK_CLOSE(h.value(x), p(x), kTight, 1.0);
}

TEST_CASE("sampling lists both limits at a jump", "[analysis][piecewise_cubic]") {
  PiecewiseCubic f({0.0, 1.0, 2.0}, {{0.0, 1.0, 0.0, 0.0}, {0.0, 1.0, 0.0, 0.0}});
  const SampledCurve s = f.sample(1);
  CHECK(s.stations == std::vector<Real>{0.0, 0.5, 1.0, 1.0, 1.5, 2.0});
  CHECK(s.values == std::vector<Real>{0.0, 0.5, 1.0, 0.0, 0.5, 1.0});
}

TEST_CASE("identical curves are equal bit for bit, never to rounding", "[analysis][piecewise_cubic][identical]") {
  // The rule is the engine's own (piecewise_cubic.h): results computed from
  // one curve may be reused for another only when both hold the same bits.
  const PiecewiseCubic a({0.0, 1.0, 2.0}, {{1.0, 2.0, 3.0, 4.0}, {0.0, -1.0, 0.5, 0.25}});
  const PiecewiseCubic same_values({0.0, 1.0, 2.0}, {{1.0, 2.0, 3.0, 4.0}, {0.0, -1.0, 0.5, 0.25}});
  CHECK(identical(a, a));
  CHECK(identical(a, same_values));  // separate knot vectors with the same values
  CHECK(identical(PiecewiseCubic{}, PiecewiseCubic{}));
  CHECK_FALSE(identical(a, PiecewiseCubic{}));

  // One unit in the last place of one coefficient, or of one knot, differs.
  const Real nudged = std::nextafter(0.25, 1.0);
  CHECK_FALSE(identical(a, PiecewiseCubic({0.0, 1.0, 2.0}, {{1.0, 2.0, 3.0, 4.0}, {0.0, -1.0, 0.5, nudged}})));
  CHECK_FALSE(identical(
      a, PiecewiseCubic({0.0, std::nextafter(1.0, 2.0), 2.0}, {{1.0, 2.0, 3.0, 4.0}, {0.0, -1.0, 0.5, 0.25}})));
  // == would call -0.0 and 0.0 equal; their bits differ, so they are not identical.
  CHECK_FALSE(identical(a, PiecewiseCubic({0.0, 1.0, 2.0}, {{1.0, 2.0, 3.0, 4.0}, {-0.0, -1.0, 0.5, 0.25}})));
  // Different piece counts over the same domain.
  CHECK_FALSE(identical(a, PiecewiseCubic({0.0, 2.0}, {{1.0, 2.0, 3.0, 4.0}})));
}
