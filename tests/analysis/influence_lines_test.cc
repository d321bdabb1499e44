#include "engine/analysis/influence_lines.h"

#include <cmath>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

// Exact where beam theory is exact; the residue is rounding in a ~100-dof solve.
constexpr Real kExact = 1e-9;

std::size_t point_at(const InfluenceLines& lines, Real station) {
  for (std::size_t p = 0; p < lines.points.size(); ++p) {
    if (std::abs(lines.points[p].station - station) < 1e-6) return p;
  }
  FAIL("no analysis point at " << station);
  return 0;
}

std::vector<Real> load_positions(Real length, int count) {
  std::vector<Real> xs;
  for (int i = 0; i <= count; ++i) xs.push_back(length * static_cast<Real>(i) / count);
  return xs;
}

}  // namespace

TEST_CASE("two-span moment and reaction influence lines match the Mueller-Breslau closed forms everywhere",
          "[analysis][influence]") {
  // Textbook closed form for two equal spans, unit load at a in span 1
  // (project REFERENCE.md section 7): M_B = -a (l^2 - a^2) / (4 l^2),
  // R_B = a / l + a (l^2 - a^2) / (2 l^3); l = 100 ft, a = 60 ft gives
  // M_B = -9.600 ft and R_B = 0.7920.
  const Real l = 100.0 * units::kFoot;
  LineGirderModel model(continuous_girder("MB-2", {l, l}), FlexuralRigidity::uniform(2 * l, 3.7e9));
  const InfluenceLines lines = compute_influence_lines(model);
  const PiecewiseCubic& m_b = lines.at_points[point_at(lines, l)].moment;
  const PiecewiseCubic& r_b = lines.support(1)->reaction;

  const Real a60 = 60.0 * units::kFoot;
  TP_CHECK_CLOSE(m_b.value(a60) / units::kFoot, -9.600, kExact, 1.0);
  TP_CHECK_CLOSE(r_b.value(a60), 0.7920, kExact, 1.0);

  // Between the nodes too: the prismatic influence line is an exact cubic.
  for (int i = 0; i <= 97; ++i) {
    const Real a = l * i / 97.0;
    TP_CHECK_CLOSE(m_b.value(a), -a * (l * l - a * a) / (4 * l * l), kExact, l);
    TP_CHECK_CLOSE(r_b.value(a), a / l + a * (l * l - a * a) / (2 * l * l * l), kExact, 1.0);
    // Symmetry of the two spans: the same curve mirrored.
    TP_CHECK_CLOSE(m_b.value(2 * l - a), m_b.value(a), kExact, l);
  }
}

TEST_CASE("simple-span influence lines are the textbook triangles and step", "[analysis][influence]") {
  // Statics of a simple span: the midspan moment influence line is a triangle
  // with peak L/4 (any structural analysis text); the shear at 0.3L is -x/L
  // left of the section and 1 - x/L right of it.
  const Real span = 24.0;
  LineGirderModel model(continuous_girder("SS", {span}), FlexuralRigidity::uniform(span, 1.0e9));
  const InfluenceLines lines = compute_influence_lines(model);
  const PointInfluenceLines& mid = lines.at_points[point_at(lines, 0.5 * span)];
  const PointInfluenceLines& p3 = lines.at_points[point_at(lines, 0.3 * span)];
  TP_CHECK_CLOSE(mid.moment.value(0.5 * span), span / 4, kExact, span);
  TP_CHECK_CLOSE(mid.moment.max_abs(), span / 4, kExact, span);
  for (Real x : load_positions(span, 73)) {
    TP_CHECK_CLOSE(mid.moment.value(x), x <= span / 2 ? x / 2 : (span - x) / 2, kExact, span);
    if (std::abs(x - 0.3 * span) > 1e-9) {
      TP_CHECK_CLOSE(p3.shear_right.value(x), x < 0.3 * span ? -x / span : 1 - x / span, kExact, 1.0);
    }
  }
  const Real s = lines.points[point_at(lines, 0.3 * span)].station;
  TP_CHECK_CLOSE(p3.shear_right.left_limit(s), -0.3, kExact, 1.0);
  TP_CHECK_CLOSE(p3.shear_right.right_limit(s), 0.7, kExact, 1.0);
  TP_CHECK_CLOSE(point_load_ordinate(p3.shear_right, ShearSide::right, s, s, 1e-9), -0.3, kExact, 1.0);
  TP_CHECK_CLOSE(point_load_ordinate(p3.shear_left, ShearSide::left, s, s, 1e-9), 0.7, kExact, 1.0);
  // The moment influence line has its root-free interior and its only
  // stationary point is the kink, which the derivative roots do not report.
  CHECK(mid.moment.stationary_points().empty());
}

TEST_CASE("fixed-end influence lines give the AISC fixed-end and propped-cantilever values", "[analysis][influence]") {
  // AISC Steel Construction Manual, Table 3-23, "beam fixed at both ends" with
  // a concentrated load at the centre: end moments PL/8, centre moment PL/8,
  // reactions P/2. "Beam fixed at one end, supported at other", concentrated
  // load at the centre: R_supported = 5P/16, R_fixed = 11P/16, M_fixed = 3PL/16.
  const Real span = 18.0;
  {
    GirderLayout layout = continuous_girder("FF", {span}, SupportKind::fixed);
    LineGirderModel model(layout, FlexuralRigidity::uniform(span, 2.0e9));
    const InfluenceLines lines = compute_influence_lines(model);
    const Real c = 0.5 * span;
    TP_CHECK_CLOSE(lines.support(0)->moment.value(c), span / 8, kExact, span);
    TP_CHECK_CLOSE(lines.support(1)->moment.value(c), -span / 8, kExact, span);
    TP_CHECK_CLOSE(lines.at_points[point_at(lines, c)].moment.value(c), span / 8, kExact, span);
    TP_CHECK_CLOSE(lines.at_points[point_at(lines, 0.0)].moment.value(c), -span / 8, kExact, span);
    TP_CHECK_CLOSE(lines.support(0)->reaction.value(c), 0.5, kExact, 1.0);
    // Fixed-end moment of a load at a: P a b^2 / L^2 (same table, general position).
    for (Real a : load_positions(span, 31)) {
      const Real b = span - a;
      TP_CHECK_CLOSE(lines.support(0)->moment.value(a), a * b * b / (span * span), kExact, span);
    }
  }
  {
    GirderLayout layout = continuous_girder("PC", {span});
    layout.supports[0] = SupportKind::fixed;
    LineGirderModel model(layout, FlexuralRigidity::uniform(span, 2.0e9));
    const InfluenceLines lines = compute_influence_lines(model);
    const Real c = 0.5 * span;
    TP_CHECK_CLOSE(lines.support(1)->reaction.value(c), 5.0 / 16, kExact, 1.0);
    TP_CHECK_CLOSE(lines.support(0)->reaction.value(c), 11.0 / 16, kExact, 1.0);
    TP_CHECK_CLOSE(lines.support(0)->moment.value(c), 3 * span / 16, kExact, span);
  }
}

TEST_CASE("reactions balance the unit load and reaction lines are one at their own support",
          "[analysis][influence][statics]") {
  // Statics (common practice): for every load position the reactions sum to
  // the unit load and their moments balance its moment; Mueller-Breslau: a
  // reaction's influence line is 1 at its support and 0 at the others.
  GirderLayout layout = continuous_girder("ST-4", {22.0, 31.0, 31.0, 25.0});
  layout.supports[4] = SupportKind::fixed;
  layout.named_points = {{"splice", 40.5}, {"cover-plate end", 70.2}};
  FlexuralRigidity rigidity;
  rigidity.then_prismatic(18.0, 2.0e9)
      .then_varying(8.0, cubic_depth_haunch(26.0, 18.0, 2.0e9, 1.6, 2))
      .then_varying(8.0, cubic_depth_haunch(22.0, 30.0, 2.0e9, 1.6, 2))
      .then_prismatic(75.0, 2.4e9);
  LineGirderModel model(layout, rigidity);
  const InfluenceLines lines = compute_influence_lines(model);
  REQUIRE(lines.supports.size() == 5);
  for (Real x : load_positions(model.length(), 211)) {
    Real force = 0;
    Real moment = 0;
    for (const SupportInfluenceLines& s : lines.supports) {
      force += s.reaction.value(x);
      moment += s.reaction.value(x) * s.station;
      if (!s.moment.empty()) moment += s.moment.value(x);
    }
    TP_CHECK_CLOSE(force, 1.0, kExact, 1.0);
    TP_CHECK_CLOSE(moment, x, kExact, model.length());
  }
  for (const SupportInfluenceLines& s : lines.supports) {
    for (const SupportInfluenceLines& other : lines.supports) {
      TP_CHECK_CLOSE(s.reaction.value(other.station), s.support_line == other.support_line ? 1.0 : 0.0, kExact, 1.0);
    }
  }
  // At a support, the shear just right minus just left is the reaction.
  for (std::size_t p = 0; p < lines.points.size(); ++p) {
    const AnalysisPoint& point = lines.points[p];
    if (!point.support || point.support == 0u || point.support == 4u) continue;
    const PiecewiseCubic jump = lines.at_points[p].shear_right - lines.at_points[p].shear_left;
    for (Real x : load_positions(model.length(), 37)) {
      TP_CHECK_CLOSE(jump.value(x), lines.support(*point.support)->reaction.value(x), kExact, 1.0);
    }
  }
  // Statics of the free body left of a section: M equals the moment of the
  // reactions to its left, less that of the load when the load is left of it.
  const std::size_t splice = point_at(lines, 40.5);
  for (Real x : load_positions(model.length(), 53)) {
    Real m = 0;
    for (const SupportInfluenceLines& s : lines.supports) {
      if (s.station < 40.5) m += s.reaction.value(x) * (40.5 - s.station);
    }
    if (x < 40.5) m -= 40.5 - x;
    TP_CHECK_CLOSE(lines.at_points[splice].moment.value(x), m, kExact, 40.5);
  }
}

TEST_CASE("deflection influence lines are reciprocal on a haunched three-span girder",
          "[analysis][influence][reciprocity]") {
  // Maxwell-Betti reciprocal theorem: the deflection at i due to a unit load
  // at j equals the deflection at j due to a unit load at i.
  LineGirderModel model(continuous_girder("MX-3", {30.0, 40.0, 30.0}), [] {
    FlexuralRigidity r;
    r.then_prismatic(24.0, 3.0e9)
        .then_varying(6.0, cubic_depth_haunch(30.0, 24.0, 3.0e9, 1.8, 2))
        .then_varying(8.0, cubic_depth_haunch(38.0, 30.0, 3.0e9, 1.8, 2))
        .then_prismatic(24.0, 3.0e9)
        .then_varying(8.0, cubic_depth_haunch(62.0, 70.0, 3.0e9, 1.8, 2))
        .then_varying(6.0, cubic_depth_haunch(76.0, 70.0, 3.0e9, 1.8, 2))
        .then_prismatic(24.0, 3.0e9);
    return r;
  }());
  const InfluenceLines lines = compute_influence_lines(model, InfluenceLineOptions{true});
  Real scale = 0;
  for (const auto& il : lines.at_points) scale = std::max(scale, il.deflection.max_abs());
  REQUIRE(scale > 0);
  for (std::size_t i = 0; i < lines.points.size(); ++i) {
    for (std::size_t j = 0; j < lines.points.size(); ++j) {
      const Real dij = lines.at_points[i].deflection.value(lines.points[j].station);
      const Real dji = lines.at_points[j].deflection.value(lines.points[i].station);
      TP_CHECK_CLOSE(dij, dji, kExact, scale);
    }
  }
}

TEST_CASE("a cantilever-suspended span has the statically determinate influence lines",
          "[analysis][influence][hinge]") {
  // Gerber girder 30 + 40 + 30 m with hinges 8 m into the middle span: the
  // suspended span (38 m to 62 m) hangs from two cantilevers. Statics alone
  // (textbook): R_A = (30 - x)/30 for a load on the left part, and
  // R_A = -(8/30) (62 - x)/24 for a load on the suspended span.
  GirderLayout layout = continuous_girder("GB", {30.0, 40.0, 30.0});
  layout.hinge_stations = {38.0, 62.0};
  LineGirderModel model(layout, FlexuralRigidity::uniform(100.0, 4.0e9));
  CHECK(model.degree_of_indeterminacy() == 0);
  const InfluenceLines lines = compute_influence_lines(model);
  const PiecewiseCubic& r_a = lines.support(0)->reaction;
  for (Real x : load_positions(100.0, 100)) {
    Real expected = 0;
    if (x <= 38.0) {
      expected = (30.0 - x) / 30.0;
    } else if (x <= 62.0) {
      expected = -(8.0 / 30.0) * (62.0 - x) / 24.0;
    }
    TP_CHECK_CLOSE(r_a.value(x), expected, kExact, 1.0);
  }
  // The moment at a hinge is zero for every load position.
  const std::size_t hinge = point_at(lines, 38.0);
  CHECK(lines.points[hinge].hinge);
  CHECK(lines.at_points[hinge].moment.max_abs() < 1e-9);
}

TEST_CASE("hinges over the piers turn a continuous girder into simple spans", "[analysis][influence][hinge]") {
  // Simple spans made continuous: under the noncomposite (hinged) system each
  // span is simply supported, so its midspan moment line is the L/4 triangle.
  const GirderLayout continuous = continuous_girder("PC-3", {25.0, 30.0, 25.0});
  const GirderLayout hinged = with_hinges_at_interior_supports(continuous);
  CHECK(hinged.hinge_stations == std::vector<Real>{25.0, 55.0});
  LineGirderModel model(hinged, FlexuralRigidity::uniform(80.0, 1.5e9));
  const InfluenceLines lines = compute_influence_lines(model);
  const PiecewiseCubic& mid = lines.at_points[point_at(lines, 40.0)].moment;
  TP_CHECK_CLOSE(mid.value(40.0), 30.0 / 4, kExact, 30.0);
  TP_CHECK_CLOSE(mid.value(20.0), 0.0, kExact, 30.0);
  TP_CHECK_CLOSE(mid.value(70.0), 0.0, kExact, 30.0);
  TP_CHECK_CLOSE(lines.support(1)->reaction.value(12.5), 0.5, kExact, 1.0);
  TP_CHECK_CLOSE(lines.support(1)->reaction.value(40.0), 0.5, kExact, 1.0);
}

TEST_CASE("influence lines of the same girder built twice are identical; a stiffness change of 1e-12 is not",
          "[analysis][influence][identical]") {
  // The same inputs give the same bits (the solve is deterministic), which is
  // what lets girder lines of one bridge share their moving-load envelopes.
  const Real l = 100.0 * units::kFoot;
  const auto lines_of = [&](Real ei_span_2, const char* label) {
    FlexuralRigidity rigidity;
    rigidity.then_prismatic(l, 3.7e9).then_prismatic(l, ei_span_2);
    GirderLayout layout = continuous_girder("ID-2", {l, l});
    layout.named_points.push_back({label, 0.35 * l});
    return compute_influence_lines(LineGirderModel(layout, rigidity));
  };
  const InfluenceLines first = lines_of(3.7e9, "splice");
  CHECK(identical(first, lines_of(3.7e9, "splice")));
  const Real nudged_ei = 3.7e9 * (1 + 1e-12);
  CHECK_FALSE(identical(first, lines_of(nudged_ei, "splice")));
  CHECK_FALSE(identical(first, lines_of(3.7e9, "field splice")));  // labels are part of the record

  // The nudged girder still has the two-span closed form of this file's
  // first test (within its 1e-9): equal to rounding, yet not identical.
  const InfluenceLines nudged = lines_of(nudged_ei, "splice");
  const PiecewiseCubic& m_b = nudged.at_points[point_at(nudged, l)].moment;
  TP_CHECK_CLOSE(m_b.value(60.0 * units::kFoot) / units::kFoot, -9.600, kExact, 1.0);
}
