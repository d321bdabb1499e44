#include "engine/live_load/uniform_load_contraflexure.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/live_load/live_load_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;
using namespace tenthpoint::live_load::test;

namespace {
// Integrated exact influence lines; rounding of a small stiffness solve.
constexpr Real kExact = 1e-9;
}  // namespace

TEST_CASE("two equal spans under uniform load have contraflexure at 3l/4 from the ends", "[live_load][contraflexure]") {
  // AISC Manual Table 3-23, two equal spans: end reactions 3wl/8, support
  // moment -wl^2/8, so M = 0 at x = 3l/4.
  const Girder g = prismatic_girder({100, 100});
  const UniformLoadContraflexure c = uniform_load_contraflexure(g.lines);
  const Real l = ft(100);
  REQUIRE(c.stations.size() == 2);
  TP_CHECK_CLOSE(c.stations[0], 0.75 * l, kExact, l);
  TP_CHECK_CLOSE(c.stations[1], 1.25 * l, kExact, l);
  REQUIRE(c.negative_regions.size() == 1);
  const std::size_t pier = point_at(*g.prepared, l);
  TP_CHECK_CLOSE(c.point_moments[pier], -l * l / 8, kExact, l * l);
  CHECK(c.in_negative_region[pier]);
  // The diagram agrees with the moment influence lines integrated over the
  // girder (Mueller-Breslau: M = w x area).
  for (std::size_t p = 0; p < g.lines.points.size(); ++p) {
    TP_CHECK_CLOSE(c.point_moments[p], g.lines.at_points[p].moment.integral(), kExact, l * l);
  }
}

TEST_CASE("three equal spans have contraflexure at 0.8 l and 0.2764 l from the piers", "[live_load][contraflexure]") {
  // AISC Manual Table 3-23, three equal spans: R_A = 0.4 wl, M_B = -0.10
  // wl^2; in the middle span M = -0.1 wl^2 + wl t/2 - w t^2/2 = 0 at t =
  // l (1 - sqrt(0.2)) / 2 = 0.276393 l.
  const Girder g = prismatic_girder({100, 100, 100});
  const UniformLoadContraflexure c = uniform_load_contraflexure(g.lines);
  const Real l = ft(100);
  const Real t = l * (1 - std::sqrt(0.2)) / 2;
  REQUIRE(c.stations.size() == 4);
  TP_CHECK_CLOSE(c.stations[0], 0.8 * l, kExact, l);
  TP_CHECK_CLOSE(c.stations[1], l + t, kExact, l);
  TP_CHECK_CLOSE(c.stations[2], 2 * l - t, kExact, l);
  TP_CHECK_CLOSE(c.stations[3], 2.2 * l, kExact, l);
  TP_CHECK_CLOSE(c.point_moments[point_at(*g.prepared, l)], -0.10 * l * l, kExact, l * l);
  TP_CHECK_CLOSE(c.point_moments[point_at(*g.prepared, 1.5 * l)], 0.025 * l * l, kExact, l * l);
}

TEST_CASE("a fixed end makes the diagram hog there", "[live_load][contraflexure]") {
  // Propped cantilever (fixed at the left): M = -wl^2/8 at the fixed end and
  // zero at x = l/4 (AISC Manual Table 3-23, beam fixed at one end).
  analysis::GirderLayout layout = analysis::continuous_girder("FIX", {ft(80)});
  layout.supports[0] = analysis::SupportKind::fixed;
  analysis::LineGirderModel model(layout, analysis::FlexuralRigidity::uniform(ft(80), 1e10));
  const analysis::InfluenceLines lines = analysis::compute_influence_lines(model);
  const UniformLoadContraflexure c = uniform_load_contraflexure(lines);
  const Real l = ft(80);
  TP_CHECK_CLOSE(c.point_moments[0], -l * l / 8, kExact, l * l);
  REQUIRE(c.stations.size() == 1);
  TP_CHECK_CLOSE(c.stations[0], l / 4, kExact, l);
}
