#include "engine/analysis/dead_load_effects.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

// Exact where beam theory is exact; the residue is rounding.
constexpr Real kExact = 1e-9;

std::size_t point_at(const std::vector<AnalysisPoint>& points, Real station) {
  for (std::size_t p = 0; p < points.size(); ++p) {
    if (std::abs(points[p].station - station) < 1e-6) return p;
  }
  FAIL("no analysis point at " << station);
  return 0;
}

// Both routes, with a check that they agree at every point and support.
struct BothRoutes {
  DeadLoadEffects direct;
  DeadLoadEffects from_lines;
};

BothRoutes analyse(const LineGirderModel& model, const DeadLoadCase& load, Real agreement = kExact) {
  BothRoutes out{solve_dead_load(model, load), dead_load_from_influence_lines(compute_influence_lines(model), load)};
  Real scale_m = 0;
  Real scale_v = 0;
  for (std::size_t p = 0; p < out.direct.moment.size(); ++p) {
    scale_m = std::max(scale_m, std::abs(out.direct.moment[p]));
    scale_v = std::max({scale_v, std::abs(out.direct.shear_left[p]), std::abs(out.direct.shear_right[p])});
  }
  for (std::size_t p = 0; p < out.direct.moment.size(); ++p) {
    INFO("point " << model.analysis_points()[p].label());
    TP_CHECK_CLOSE(out.from_lines.moment[p], out.direct.moment[p], agreement, scale_m);
    TP_CHECK_CLOSE(out.from_lines.shear_left[p], out.direct.shear_left[p], agreement, scale_v);
    TP_CHECK_CLOSE(out.from_lines.shear_right[p], out.direct.shear_right[p], agreement, scale_v);
    // The diagrams reproduce the point values.
    const Real x = model.analysis_points()[p].station;
    TP_CHECK_CLOSE(out.direct.moment_diagram.value(x), out.direct.moment[p], agreement, scale_m);
  }
  for (std::size_t s = 0; s < out.direct.reactions.size(); ++s) {
    TP_CHECK_CLOSE(out.from_lines.reactions[s], out.direct.reactions[s], agreement, scale_v);
    TP_CHECK_CLOSE(out.from_lines.support_moments[s], out.direct.support_moments[s], agreement, scale_m);
  }
  return out;
}

}  // namespace

TEST_CASE("two equal spans under uniform load match AISC Table 3-23", "[analysis][dead_load]") {
  // AISC Steel Construction Manual, Table 3-23, continuous beam, two equal
  // spans, uniform load on both: end reactions 3wl/8, centre reaction 10wl/8,
  // support moment -wl^2/8, M+ = 9wl^2/128 at 3l/8 from the end.
  const Real l = 27.0;
  const Real w = 14.0e3;
  GirderLayout layout = continuous_girder("A2", {l, l});
  layout.named_points = {{"3l/8", 3 * l / 8}};
  LineGirderModel model(layout, FlexuralRigidity::uniform(2 * l, 5.0e9));
  const BothRoutes r = analyse(model, DeadLoadCase{"DC1"}.add_uniform(w));
  for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
    TP_CHECK_CLOSE(e->reactions[0], 3 * w * l / 8, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[1], 10 * w * l / 8, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[2], 3 * w * l / 8, kExact, w * l);
    const auto& points = model.analysis_points();
    TP_CHECK_CLOSE(e->moment[point_at(points, l)], -w * l * l / 8, kExact, w * l * l);
    TP_CHECK_CLOSE(e->moment[point_at(points, 3 * l / 8)], 9 * w * l * l / 128, kExact, w * l * l);
    // Shear either side of the pier: -5wl/8 and +5wl/8 (same table).
    TP_CHECK_CLOSE(e->shear_left[point_at(points, l)], -5 * w * l / 8, kExact, w * l);
    TP_CHECK_CLOSE(e->shear_right[point_at(points, l)], 5 * w * l / 8, kExact, w * l);
  }
  // The exact diagram peaks at 3l/8 with 9wl^2/128: a stationary point of the
  // quadratic piece.
  const std::vector<Real> stationary = r.direct.moment_diagram.stationary_points();
  REQUIRE_FALSE(stationary.empty());
  TP_CHECK_CLOSE(stationary.front(), 3 * l / 8, kExact, l);
}

TEST_CASE("two spans with one span loaded match AISC Table 3-23", "[analysis][dead_load]") {
  // AISC Table 3-23, two equal spans, uniform load on one span: support
  // moment -wl^2/16; reactions 7/16, 5/8 and -1/16 times wl.
  const Real l = 20.0;
  const Real w = 9.0e3;
  LineGirderModel model(continuous_girder("A2P", {l, l}), FlexuralRigidity::uniform(2 * l, 1.0e9));
  const BothRoutes r = analyse(model, DeadLoadCase{"DW"}.add_partial(0.0, l, w));
  for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
    TP_CHECK_CLOSE(e->reactions[0], 7 * w * l / 16, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[1], 5 * w * l / 8, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[2], -w * l / 16, kExact, w * l);
    TP_CHECK_CLOSE(e->moment[point_at(model.analysis_points(), l)], -w * l * l / 16, kExact, w * l * l);
  }
}

TEST_CASE("a load at the centre of one of two spans matches AISC Table 3-23", "[analysis][dead_load]") {
  // AISC Table 3-23, two equal spans, concentrated load P at the centre of one
  // span: reactions 13P/32, 11P/16, -3P/32; support moment -3Pl/32.
  const Real l = 16.0;
  const Real p = 250.0e3;
  LineGirderModel model(continuous_girder("A2C", {l, l}), FlexuralRigidity::uniform(2 * l, 1.0e9));
  const BothRoutes r = analyse(model, DeadLoadCase{"DC1"}.add_point(l / 2, p, "diaphragm"));
  const auto& points = model.analysis_points();
  for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
    TP_CHECK_CLOSE(e->reactions[0], 13 * p / 32, kExact, p);
    TP_CHECK_CLOSE(e->reactions[1], 11 * p / 16, kExact, p);
    TP_CHECK_CLOSE(e->reactions[2], -3 * p / 32, kExact, p);
    TP_CHECK_CLOSE(e->moment[point_at(points, l)], -3 * p * l / 32, kExact, p * l);
    // Under the load the shear jumps by P: 13P/32 left of it, 13P/32 - P right.
    const std::size_t c = point_at(points, l / 2);
    TP_CHECK_CLOSE(e->shear_left[c], 13 * p / 32, kExact, p);
    TP_CHECK_CLOSE(e->shear_right[c], 13 * p / 32 - p, kExact, p);
  }
  TP_CHECK_CLOSE(r.direct.shear_diagram.left_limit(l / 2), 13 * p / 32, kExact, p);
  TP_CHECK_CLOSE(r.direct.shear_diagram.right_limit(l / 2), 13 * p / 32 - p, kExact, p);
}

TEST_CASE("three equal spans under uniform load match AISC Table 3-23", "[analysis][dead_load]") {
  // AISC Table 3-23, three equal spans: reactions 0.4wl, 1.1wl, 1.1wl, 0.4wl;
  // support moment -0.10wl^2; end-span M+ 0.08wl^2 at 0.4l; 0.025wl^2 at the
  // centre of the middle span (these decimals are exact: 2/5, 11/10, 1/10, 2/25, 1/40).
  const Real l = 30.0;
  const Real w = 20.0e3;
  LineGirderModel model(continuous_girder("A3", {l, l, l}), FlexuralRigidity::uniform(3 * l, 8.0e9));
  const BothRoutes r = analyse(model, DeadLoadCase{"DC2"}.add_uniform(w));
  const auto& points = model.analysis_points();
  for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
    TP_CHECK_CLOSE(e->reactions[0], 0.4 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[1], 1.1 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[2], 1.1 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[3], 0.4 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->moment[point_at(points, l)], -0.10 * w * l * l, kExact, w * l * l);
    TP_CHECK_CLOSE(e->moment[point_at(points, 0.4 * l)], 0.08 * w * l * l, kExact, w * l * l);
    TP_CHECK_CLOSE(e->moment[point_at(points, 1.5 * l)], 0.025 * w * l * l, kExact, w * l * l);
  }
}

TEST_CASE("four equal spans under uniform load match the three-moment equation", "[analysis][dead_load]") {
  // AISC Table 3-23, four equal spans, lists M_B = -0.1071wl^2,
  // M_C = -0.0714wl^2 and reactions 0.393, 1.143, 0.929 wl, rounded. The
  // exact values from Clapeyron's three-moment equation are M_B = -3/28,
  // M_C = -2/28 wl^2, R_A = 11/28, R_B = 32/28, R_C = 26/28 wl.
  const Real l = 25.0;
  const Real w = 11.0e3;
  LineGirderModel model(continuous_girder("A4", {l, l, l, l}), FlexuralRigidity::uniform(4 * l, 3.0e9));
  const BothRoutes r = analyse(model, DeadLoadCase{"DC2"}.add_uniform(w));
  const auto& points = model.analysis_points();
  for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
    TP_CHECK_CLOSE(e->moment[point_at(points, l)], -3.0 / 28 * w * l * l, kExact, w * l * l);
    TP_CHECK_CLOSE(e->moment[point_at(points, 2 * l)], -2.0 / 28 * w * l * l, kExact, w * l * l);
    TP_CHECK_CLOSE(e->reactions[0], 11.0 / 28 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[1], 32.0 / 28 * w * l, kExact, w * l);
    TP_CHECK_CLOSE(e->reactions[2], 26.0 / 28 * w * l, kExact, w * l);
    // And the table's rounded figures, to their printed precision.
    CHECK(std::abs(e->moment[point_at(points, l)] / (w * l * l) + 0.1071) < 5e-5);
    CHECK(std::abs(e->reactions[1] / (w * l) - 1.143) < 5e-4);
  }
}

TEST_CASE("fixed-end and propped beams under uniform load match AISC Table 3-23", "[analysis][dead_load]") {
  // AISC Table 3-23: beam fixed at both ends, uniform load: end moments
  // wl^2/12, centre wl^2/24, reactions wl/2. Beam fixed at one end, supported
  // at the other: R_supported = 3wl/8, R_fixed = 5wl/8, M_fixed = wl^2/8,
  // M+ = 9wl^2/128 at 3l/8 from the supported end.
  const Real l = 15.0;
  const Real w = 7.0e3;
  {
    LineGirderModel model(continuous_girder("FF", {l}, SupportKind::fixed), FlexuralRigidity::uniform(l, 1.0e9));
    const BothRoutes r = analyse(model, DeadLoadCase{"DC1"}.add_uniform(w));
    for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
      TP_CHECK_CLOSE(e->support_moments[0], w * l * l / 12, kExact, w * l * l);
      TP_CHECK_CLOSE(e->support_moments[1], -w * l * l / 12, kExact, w * l * l);
      TP_CHECK_CLOSE(e->moment[point_at(model.analysis_points(), l / 2)], w * l * l / 24, kExact, w * l * l);
      TP_CHECK_CLOSE(e->moment[point_at(model.analysis_points(), 0.0)], -w * l * l / 12, kExact, w * l * l);
      TP_CHECK_CLOSE(e->reactions[0], w * l / 2, kExact, w * l);
    }
  }
  {
    GirderLayout layout = continuous_girder("PC", {l});
    layout.supports[1] = SupportKind::fixed;
    layout.named_points = {{"3l/8", 3 * l / 8}};
    LineGirderModel model(layout, FlexuralRigidity::uniform(l, 1.0e9));
    const BothRoutes r = analyse(model, DeadLoadCase{"DC1"}.add_uniform(w));
    for (const DeadLoadEffects* e : {&r.direct, &r.from_lines}) {
      TP_CHECK_CLOSE(e->reactions[0], 3 * w * l / 8, kExact, w * l);
      TP_CHECK_CLOSE(e->reactions[1], 5 * w * l / 8, kExact, w * l);
      TP_CHECK_CLOSE(e->support_moments[1], -w * l * l / 8, kExact, w * l * l);
      TP_CHECK_CLOSE(e->moment[point_at(model.analysis_points(), 3 * l / 8)], 9 * w * l * l / 128, kExact, w * l * l);
    }
  }
}

TEST_CASE("mixed dead loads agree between the direct solve and the influence lines", "[analysis][dead_load]") {
  // Internal consistency (common practice): two independent routes to the
  // same statically indeterminate answer, on a haunched girder with a
  // partial load, diaphragms between and on nodes, and a fixed end.
  GirderLayout layout = continuous_girder("MIX", {28.0, 36.0, 28.0});
  layout.supports[3] = SupportKind::fixed;
  FlexuralRigidity rigidity;
  rigidity.then_prismatic(22.0, 4.0e9)
      .then_varying(6.0, cubic_depth_haunch(28.0, 22.0, 4.0e9, 1.5, 2))
      .then_varying(7.0, cubic_depth_haunch(28.0, 35.0, 4.0e9, 1.5, 2))
      .then_prismatic(57.0, 4.0e9);
  LineGirderModel model(layout, rigidity);
  DeadLoadCase load{"DC1"};
  load.add_uniform(12.0e3).add_partial(5.3, 47.9, 3.5e3).add_point(14.0, 40.0e3, "diaphragm");
  load.add_point(40.6, 35.0e3).add_point(0.0, 10.0e3).add_point(28.0, 22.0e3);
  // On the haunches the consistent loads of the direct solve and the cubic
  // interpolation of the influence lines are both approximations within the
  // model's interpolation tolerance (1e-7); 1e-6 of the largest value bounds
  // their difference.
  const BothRoutes r = analyse(model, load, 1e-6);
  // Global equilibrium of the direct solution: reactions carry the load.
  Real total = 12.0e3 * 92.0 + 3.5e3 * (47.9 - 5.3) + 40.0e3 + 35.0e3 + 10.0e3 + 22.0e3;
  Real sum = 0;
  for (Real rx : r.direct.reactions) sum += rx;
  TP_CHECK_CLOSE(sum, total, kExact, total);
}

TEST_CASE("dead loads off the girder are rejected with the bridge and case named", "[analysis][dead_load]") {
  LineGirderModel model(continuous_girder("OFF-1", {10.0}), FlexuralRigidity::uniform(10.0, 1.0e9));
  try {
    (void)solve_dead_load(model, DeadLoadCase{"DW"}.add_point(12.0, 1.0));
    FAIL("expected ModelError");
  } catch (const ModelError& e) {
    CHECK(e.bridge_id() == "OFF-1");
    CHECK(e.cause() == "dead load 'DW': the concentrated load at 12 m is not on the girder (0 to 10 m)");
  }
  CHECK_THROWS_AS(solve_dead_load(model, DeadLoadCase{"DW"}.add_partial(6.0, 4.0, 1.0)), ModelError);
}
