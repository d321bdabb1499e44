#include "engine/live_load/effect_curve.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/live_load/live_load_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;
using namespace tenthpoint::live_load::test;

namespace {
constexpr Real kExact = 1e-9;  // exact cubics; rounding of the stiffness solve
}

TEST_CASE("areas, peaks and loaded regions of a pier moment line match Mueller-Breslau", "[live_load][curve]") {
  // Two equal spans l: M_B(a) = -a (l^2 - a^2) / (4 l^2) (REFERENCE.md
  // section 7); negative everywhere, area -l^2/16 per span, peak -l/(6 sqrt 3)
  // at a = l / sqrt 3.
  const Girder g = prismatic_girder({100, 100});
  const Real l = ft(100);
  const EffectCurve& c = g.prepared->curve(EffectKind::moment, point_at(*g.prepared, l));
  CHECK(c.positive_area() == 0.0);
  TP_CHECK_CLOSE(c.negative_area(), -l * l / 8, kExact, l * l);
  TP_CHECK_CLOSE(c.negative_area(), c.curve().negative_area(c.curve().start(), c.curve().end()), kExact, l * l);
  TP_CHECK_CLOSE(c.peak(Extreme::minimum).value, -l / (6 * std::sqrt(3.0)), kExact, l);
  // The two spans tie; either peak is the extreme.
  const Real x = c.peak(Extreme::minimum).station;
  CHECK((std::abs(x - l / std::sqrt(3.0)) < 1e-9 * l || std::abs(x - (2 * l - l / std::sqrt(3.0))) < 1e-9 * l));
  CHECK(c.peak(Extreme::minimum).approach == Approach::exact);
  REQUIRE(c.regions(Extreme::minimum).size() == 1);
  TP_CHECK_CLOSE(c.regions(Extreme::minimum)[0].end, 2 * l, kExact, l);
}

TEST_CASE("a span moment line changes sign in the next span, and its parts add up", "[live_load][curve]") {
  // Moment at 0.4 l of span 1 of two spans: positive in span 1, negative in
  // span 2 (Mueller-Breslau). Positive plus negative area is the integral.
  const Girder g = prismatic_girder({100, 100});
  const EffectCurve& c = g.prepared->curve(EffectKind::moment, point_at(*g.prepared, ft(40)));
  const analysis::PiecewiseCubic& f = c.curve();
  TP_CHECK_CLOSE(c.positive_area(), f.positive_area(f.start(), f.end()), kExact, 1e3);
  TP_CHECK_CLOSE(c.positive_area() + c.negative_area(), f.integral(), kExact, 1e3);
  REQUIRE(c.regions(Extreme::maximum).size() == 1);
  REQUIRE(c.regions(Extreme::minimum).size() == 1);
  TP_CHECK_CLOSE(c.regions(Extreme::maximum)[0].end, ft(100), kExact, 1.0);
}

TEST_CASE("a shear line's peak next to its section is a one-sided limit", "[live_load][curve]") {
  // Simple span, shear at 0.3 L: -x/L left of the section, 1 - x/L right
  // (statics): maximum 0.7 just right of it, minimum -0.3 just left.
  const Girder g = prismatic_girder({60});
  const Real s = ft(18);
  const EffectCurve& c = g.prepared->curve(EffectKind::shear_right, point_at(*g.prepared, s));
  TP_CHECK_CLOSE(c.peak(Extreme::maximum).value, 0.7, kExact, 1.0);
  CHECK(c.peak(Extreme::maximum).approach == Approach::from_right);
  TP_CHECK_CLOSE(c.peak(Extreme::minimum).value, -0.3, kExact, 1.0);
  CHECK(c.peak(Extreme::minimum).approach == Approach::from_left);
  TP_CHECK_CLOSE(c.ordinate(s, Approach::from_left), -0.3, kExact, 1.0);
  TP_CHECK_CLOSE(c.ordinate(s, Approach::from_right), 0.7, kExact, 1.0);
  // A load exactly at the section is on the far side of the cut just right.
  TP_CHECK_CLOSE(c.ordinate(s, Approach::exact), -0.3, kExact, 1.0);
  REQUIRE(c.discontinuities().size() == 1);
  TP_CHECK_CLOSE(c.discontinuities()[0], s, kExact, 1.0);
}
