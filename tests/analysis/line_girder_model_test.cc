#include "engine/analysis/line_girder_model.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <limits>
#include <stdexcept>

#include <catch2/catch.hpp>

#include "engine/analysis/gauss_legendre_rule.h"
#include "engine/analysis/girder_stability.h"
#include "engine/analysis/influence_lines.h"
#include "engine/core/errors.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

std::string model_error_cause(const GirderLayout& layout, const FlexuralRigidity& rigidity, ModelOptions options = {}) {
  try {
    LineGirderModel model(layout, rigidity, options);
  } catch (const ModelError& e) {
    CHECK(e.bridge_id() == layout.bridge_id);
    return e.cause();
  }
  FAIL("expected a ModelError");
  return {};
}

FlexuralRigidity three_span_haunched() {
  // 30 + 40 + 30 m with parabolic haunches over both piers: depth 1.8 times
  // the midspan depth at the pier, EI ~ depth^3 (about 5.8 times), over 6 m
  // of each end span and 8 m of the middle span.
  FlexuralRigidity r;
  const Real ei = 3.0e9;
  r.then_prismatic(24.0, ei)
      .then_varying(6.0, cubic_depth_haunch(24.0, 30.0, ei, 1.8, 2))
      .then_varying(8.0, cubic_depth_haunch(38.0, 30.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei)
      .then_varying(8.0, cubic_depth_haunch(62.0, 70.0, ei, 1.8, 2))
      .then_varying(6.0, cubic_depth_haunch(76.0, 70.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei);
  return r;
}

}  // namespace

TEST_CASE("analysis points are the tenth points, supports, hinges, section changes and named points",
          "[analysis][model]") {
  GirderLayout layout = continuous_girder("AP", {20.0, 25.0});
  layout.named_points = {{"splice", 31.0}, {"near tenth point", 10.0004}};
  layout.hinge_stations = {27.5};
  FlexuralRigidity rigidity;
  rigidity.then_prismatic(17.0, 1e9).then_prismatic(28.0, 2e9);
  const LineGirderModel model(layout, rigidity);
  const auto& points = model.analysis_points();
  // 21 distinct tenth points (the pier is shared), plus splice, section change
  // at 17 m; the hinge at 27.5 m is the 0.3L point of span 2; the named point
  // 0.4 mm from 10 m merges with it (station tolerance 1 mm).
  CHECK(points.size() == 23);
  const auto pier = std::find_if(points.begin(), points.end(), [](const AnalysisPoint& p) { return p.support == 1u; });
  REQUIRE(pier != points.end());
  CHECK(pier->station == 20.0);
  CHECK(pier->span == 1);
  CHECK(pier->tenth == 0);
  CHECK(pier->label() == "support 2 / span 1 1.0L / span 2 0.0L");
  const auto hinge = std::find_if(points.begin(), points.end(), [](const AnalysisPoint& p) { return p.hinge; });
  REQUIRE(hinge != points.end());
  CHECK(hinge->station == 27.5);
  CHECK(hinge->label() == "hinge / span 2 0.3L");
  const auto merged = std::find_if(points.begin(), points.end(), [](const AnalysisPoint& p) {
    return p.label() == "span 1 0.5L / near tenth point";
  });
  CHECK(merged != points.end());
  CHECK(std::any_of(points.begin(), points.end(),
                    [](const AnalysisPoint& p) { return p.section_change && p.station == 17.0; }));
  CHECK(model.degree_of_indeterminacy() == 0);
}

TEST_CASE("a linearly tapered propped cantilever matches the force-method closed form between nodes",
          "[analysis][model][non_prismatic]") {
  // Fixed at x = 0, roller at L, EI = ei0 (1 + c x) (doubling along the span).
  // Force method with virtual work (textbook): the prop reaction for a unit
  // load at a is R(a) = int_0^a (a - x)(L - x) g dx / int_0^L (L - x)^2 g dx,
  // g = 1/EI, with exact logarithmic antiderivatives of x^k / (1 + c x)
  // (Gradshteyn & Ryzhik 2.111). The engine's curve between its nodes must be
  // within the promised 1e-6 of the largest ordinate.
  const Real l = 20.0;
  const Real c = 1.0 / l;
  const Real ei0 = 2.0e9;
  auto i0 = [c](Real x) { return std::log1p(c * x) / c; };
  auto i1 = [c](Real x) { return x / c - std::log1p(c * x) / (c * c); };
  auto i2 = [c](Real x) { return x * x / (2 * c) - x / (c * c) + std::log1p(c * x) / (c * c * c); };
  auto prop = [&](Real a) {
    const Real num = i2(a) - (a + l) * i1(a) + a * l * i0(a);
    const Real den = i2(l) - 2 * l * i1(l) + l * l * i0(l);
    return num / den;
  };
  GirderLayout layout = continuous_girder("TAPER", {l});
  layout.supports[0] = SupportKind::fixed;
  FlexuralRigidity rigidity;
  rigidity.then_varying(l, [=](Real x) { return ei0 * (1 + c * x); });
  const LineGirderModel model(layout, rigidity);
  CHECK(model.elements().size() > 10);  // the tenth-point bays were subdivided
  const InfluenceLines lines = compute_influence_lines(model);
  const PiecewiseCubic& r = lines.support(1)->reaction;
  Real worst = 0;
  for (int i = 0; i <= 997; ++i) {
    const Real a = l * i / 997.0;
    worst = std::max(worst, std::abs(r.value(a) - prop(a)));
  }
  INFO("largest error " << worst);
  CHECK(worst < 1e-6);
  // At the nodes the values are exact (to quadrature rounding).
  for (const AnalysisPoint& p : lines.points) TP_CHECK_CLOSE(r.value(p.station), prop(p.station), 1e-11, 1.0);
}

TEST_CASE("haunched influence lines match the force method to 1e-6 between nodes", "[analysis][model][non_prismatic]") {
  // Reference: the flexibility (force) method of any structural analysis text,
  // independent of the stiffness model. Primary structure: the 100 m girder
  // simply supported at its ends; redundants: the pier reactions X1 (30 m) and
  // X2 (70 m). With m0 the primary moment of the unit load at a and m_i that
  // of a unit upward force at pier i, compatibility (virtual work) reads
  //   sum_j X_j int m_i m_j / EI dx = -int m_i m0 / EI dx.
  // The integrals are taken by 24-point Gauss-Legendre on every stretch where
  // the integrand is smooth (cut at the piers, the load and the haunch ends):
  // error far below 1e-12. A very fine stiffness mesh is no reference: its
  // conditioning decays like (span/element)^3, which at 6000 elements costs
  // about 1e-4.
  const GirderLayout layout = continuous_girder("H3", {30.0, 40.0, 30.0});
  const FlexuralRigidity rigidity = three_span_haunched();
  const LineGirderModel model(layout, rigidity);
  CHECK(model.elements().size() < 120);  // the haunches are subdivided, not over-meshed
  const InfluenceLines lines = compute_influence_lines(model);

  const Real l = 100.0;
  const Real piers[2] = {30.0, 70.0};
  const GaussLegendreRule rule(24);
  auto simple_moment = [l](Real load, Real x) { return x <= load ? (l - load) * x / l : load * (l - x) / l; };
  auto integrate = [&](auto&& f, Real extra_cut) {
    std::vector<Real> cuts{0.0, 24.0, 30.0, 38.0, 62.0, 70.0, 76.0, 100.0};
    if (extra_cut > 0.0 && extra_cut < l) cuts.push_back(extra_cut);
    std::sort(cuts.begin(), cuts.end());
    Real sum = 0;
    for (std::size_t i = 0; i + 1 < cuts.size(); ++i) {
      if (cuts[i + 1] > cuts[i])
        sum += rule.integrate([&](Real x) { return f(x) / rigidity.at(x); }, cuts[i], cuts[i + 1]);
    }
    return sum;
  };
  Real d[2][2];
  for (int i = 0; i < 2; ++i) {
    for (int j = 0; j < 2; ++j) {
      d[i][j] = integrate([&](Real x) { return simple_moment(piers[i], x) * simple_moment(piers[j], x); }, -1.0);
    }
  }
  auto redundants = [&](Real a) {
    // m_i = -simple_moment(pier_i, x) (upward unit force).
    Real r[2];
    for (int i = 0; i < 2; ++i) {
      r[i] = integrate([&](Real x) { return simple_moment(piers[i], x) * simple_moment(a, x); }, a);
    }
    // sum_j d_ij X_j = r_i (signs of m_i and m_j cancel on the left).
    const Real det = d[0][0] * d[1][1] - d[0][1] * d[1][0];
    return std::array<Real, 2>{(r[0] * d[1][1] - r[1] * d[0][1]) / det, (d[0][0] * r[1] - d[1][0] * r[0]) / det};
  };

  Real worst_reaction = 0;
  Real worst_moment = 0;
  std::vector<std::size_t> sections;
  for (std::size_t p = 0; p < lines.points.size(); ++p) sections.push_back(p);
  std::vector<Real> moment_scale(lines.points.size());
  for (std::size_t p = 0; p < lines.points.size(); ++p)
    moment_scale[p] = std::max(lines.at_points[p].moment.max_abs(), Real{1});  // pinned ends: zero line
  for (int i = 0; i <= 1999; ++i) {
    const Real a = l * (i + 0.5) / 2000.0;
    const auto x = redundants(a);
    const Real r_left = 1.0 - a / l - x[0] * (l - piers[0]) / l - x[1] * (l - piers[1]) / l;
    worst_reaction = std::max({worst_reaction, std::abs(lines.support(1)->reaction.value(a) - x[0]),
                               std::abs(lines.support(2)->reaction.value(a) - x[1]),
                               std::abs(lines.support(0)->reaction.value(a) - r_left)});
    // Moments at every analysis point from the reference reactions, by statics.
    for (std::size_t p = 0; p < lines.points.size(); ++p) {
      const Real s = lines.points[p].station;
      Real m = r_left * s;
      for (int k = 0; k < 2; ++k) {
        if (piers[k] < s) m += x[static_cast<std::size_t>(k)] * (s - piers[k]);
      }
      if (a < s) m -= s - a;
      worst_moment = std::max(worst_moment, std::abs(lines.at_points[p].moment.value(a) - m) / moment_scale[p]);
    }
  }
  INFO("largest reaction error " << worst_reaction << ", largest relative moment error " << worst_moment);
  CHECK(worst_reaction < 1e-6);
  CHECK(worst_moment < 1e-6);
  // At the tenth points (nodes) the values are exact to rounding.
  for (const AnalysisPoint& p : lines.points) {
    TP_CHECK_CLOSE(lines.support(1)->reaction.value(p.station), redundants(p.station)[0], 1e-10, 1.0);
  }
}

TEST_CASE("mechanisms are rejected with the bridge and the loose part named", "[analysis][model][errors]") {
  const FlexuralRigidity ei = FlexuralRigidity::uniform(30.0, 1e9);
  SECTION("a hinge inside a simple span") {
    GirderLayout layout = continuous_girder("MECH-1", {30.0});
    layout.hinge_stations = {12.0};
    CHECK(model_error_cause(layout, ei) == "the part of the girder from 0 m to 12 m (span 1) can move as a mechanism");
    // The factorisation catches it too when the statics test is skipped.
    ModelOptions no_statics;
    no_statics.check_statics = false;
    CHECK_THAT(model_error_cause(layout, ei, no_statics),
               Catch::Matchers::StartsWith("the stiffness matrix is singular at the"));
  }
  SECTION("an end span with two hinges has a part on no support") {
    GirderLayout layout = continuous_girder("MECH-2", {10.0, 10.0, 10.0});
    layout.hinge_stations = {3.0, 7.0};
    // Both [0, 3] (one support) and [3, 7] (none) are loose; the first is named.
    CHECK(model_error_cause(layout, ei) == "the part of the girder from 0 m to 3 m (span 1) can move as a mechanism");
  }
  SECTION("an overhang released at its support is unsupported") {
    GirderLayout layout = continuous_girder("MECH-3", {20.0, 10.0});
    layout.supports[2] = SupportKind::free;
    CHECK_NOTHROW(LineGirderModel(layout, ei));  // a plain overhang stands
    layout.hinge_stations = {20.0};
    CHECK(model_error_cause(layout, ei) == "the part of the girder from 20 m to 30 m (span 2) can move as a mechanism");
  }
  SECTION("no supports at all") {
    GirderLayout layout = continuous_girder("MECH-4", {30.0}, SupportKind::free);
    CHECK(model_error_cause(layout, ei) == "the girder has no supports");
  }
}

TEST_CASE("the statics test counts indeterminacy and accepts Gerber girders", "[analysis][model][stability]") {
  // Degree of indeterminacy = restraints - 2 - hinges (textbook statics).
  CHECK(assess_stability(continuous_girder("S", {10.0, 10.0, 10.0})).degree_of_indeterminacy == 2);
  GirderLayout gerber = continuous_girder("G", {10.0, 14.0, 10.0});
  gerber.hinge_stations = {13.0, 21.0};
  const GirderStability g = assess_stability(gerber);
  CHECK(g.stable);
  CHECK(g.degree_of_indeterminacy == 0);
  GirderLayout propped = continuous_girder("P", {10.0}, SupportKind::fixed);
  CHECK(assess_stability(propped).degree_of_indeterminacy == 2);
  GirderLayout cantilever = continuous_girder("C", {10.0});
  cantilever.supports = {SupportKind::fixed, SupportKind::free};
  CHECK(assess_stability(cantilever).stable);
}

TEST_CASE("bad rigidities are rejected, never turned into NaNs", "[analysis][model][errors]") {
  const GirderLayout layout = continuous_girder("EI-1", {20.0, 20.0});
  CHECK(model_error_cause(layout, FlexuralRigidity::uniform(40.0, 0.0)) ==
        "flexural rigidity must be positive and finite: EI = 0 N*m^2 in segment 1 (0 m to 40 m)");
  FlexuralRigidity negative;
  negative.then_prismatic(15.0, 1e9).then_varying(25.0, [](Real x) { return 1e9 * (29.3 - x); });
  CHECK_THAT(model_error_cause(layout, negative),
             Catch::Matchers::StartsWith("flexural rigidity must be positive and finite: EI = -"));
  FlexuralRigidity nan;
  nan.then_varying(40.0, [](Real) { return std::numeric_limits<Real>::quiet_NaN(); });
  CHECK_THAT(model_error_cause(layout, nan),
             Catch::Matchers::StartsWith("flexural rigidity must be positive and finite: EI = nan"));
  FlexuralRigidity gap;
  gap.segments = {RigiditySegment{0.0, 10.0, 1e9, {}, {}}, RigiditySegment{11.0, 40.0, 1e9, {}, {}}};
  CHECK(model_error_cause(layout, gap) ==
        "rigidity segment 2 starts at 11 m, but the previous one ends at 10 m (segments must follow each other "
        "without gaps or overlaps)");
  CHECK(model_error_cause(layout, FlexuralRigidity::uniform(35.0, 1e9)) ==
        "rigidity segments end at 35 m but the girder is 40 m long");
  // Absurd contrast: the pivot test names the place instead of returning garbage.
  FlexuralRigidity contrast;
  contrast.then_prismatic(19.0, 1e9).then_prismatic(2.0, 1e-9).then_prismatic(19.0, 1e9);
  CHECK_THAT(model_error_cause(layout, contrast), Catch::Matchers::Contains("the stiffness matrix is singular"));
}

TEST_CASE("bad layouts and options are rejected", "[analysis][model][errors]") {
  const FlexuralRigidity ei = FlexuralRigidity::uniform(20.0, 1e9);
  GirderLayout layout = continuous_girder("L-1", {20.0});
  layout.supports.pop_back();
  CHECK(model_error_cause(layout, ei) == "1 spans need 2 support lines, 1 given");
  layout = continuous_girder("L-2", {20.0}, SupportKind::fixed);
  layout.hinge_stations = {20.0};
  CHECK(model_error_cause(layout, ei) == "hinge at 20 m is not strictly inside the girder (0 to 20 m)");
  layout = continuous_girder("L-3", {10.0, 10.0});
  layout.supports[1] = SupportKind::fixed;
  layout.hinge_stations = {10.0};
  CHECK(model_error_cause(layout, ei) == "hinge at 10 m coincides with fixed support 2");
  layout = continuous_girder("L-4", {20.0});
  layout.named_points = {{"far", 25.0}};
  CHECK(model_error_cause(layout, ei) == "named point 'far' at 25 m is outside the girder (0 to 20 m)");
  CHECK(model_error_cause(continuous_girder("L-5", {-3.0, 23.0}), ei) ==
        "span 1 has length -3 m; spans must be finite and longer than 0.01 m");
  ModelOptions bad;
  bad.gauss_points = 1;
  CHECK_THROWS_AS(LineGirderModel(continuous_girder("L-6", {20.0}), ei, bad), std::invalid_argument);
}
