// InfluenceLines: every influence line of one LineGirderModel, as exact
// piecewise cubics in the position of a unit load.
//
// Loading and units. A unit downward force (1 N) stands at station x (m from
// the left end of the girder); each curve gives the effect as a function of
// x. Ordinates: moments in N*m per N (= m), shears and reactions in N per N,
// support moments in N*m per N, deflections in m per N. Every curve has the
// model's node stations as knots and is zero off the girder.
//
// Sign conventions (the engine's throughout):
//   moment        positive sagging (tension at the bottom fibre);
//   shear         the resultant of the forces left of the section, positive
//                 upward; then dM/dx = V along the girder;
//   reaction      the vertical force the support exerts on the girder,
//                 positive upward;
//   support moment the moment a fixed support exerts on the girder, positive
//                 counterclockwise (x to the right, y up);
//   deflection    vertical displacement, positive downward.
//
// Shear at a section jumps by 1 when the load crosses the section, so each
// point has two shear curves: shear_left (on a cut just left of the point)
// and shear_right (just right). They differ as functions only at a support,
// where shear_right - shear_left is the reaction; elsewhere they are the same
// curve. At the section itself the curve jumps by +1 (moving right); a load
// standing exactly at the section is on the far side of each cut, so its
// ordinate is right_limit - 1 for shear_right and left_limit + 1 for
// shear_left (point_load_ordinate applies this rule). Beyond the girder's
// ends the shear is zero.
//
// Method (Maxwell-Betti / Mueller-Breslau). For an effect E = c^T u + (local
// end-force terms of the element that defines E), solve K z = c once; the
// influence line is then the deflected shape of the influence state -z (with
// a unit imposed displacement for a reaction). Its nodal deflections and
// rotations are the curve's values and slopes at the knots, exact because the
// element stiffnesses are; inside each element the curve is the cubic Hermite
// interpolant of them, plus the jump (shear) or kink (moment) at the section.
// For a prismatic element this cubic is the exact influence line (the Hermite
// functions are the exact nodal loads of a point load); for a non-prismatic
// one it is within the model's interpolation tolerance.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "engine/analysis/analysis_point.h"
#include "engine/analysis/line_girder_model.h"
#include "engine/analysis/piecewise_cubic.h"

namespace tenthpoint::analysis {

struct InfluenceLineOptions {
  bool deflections = false;  // also compute deflection influence lines
};

struct PointInfluenceLines {
  PiecewiseCubic moment;
  PiecewiseCubic shear_left;
  PiecewiseCubic shear_right;
  PiecewiseCubic deflection;  // empty unless requested
};

struct SupportInfluenceLines {
  std::size_t support_line = 0;
  Real station = 0;  // m
  PiecewiseCubic reaction;
  PiecewiseCubic moment;  // empty unless the support is fixed
};

struct InfluenceLines {
  std::string bridge_id;
  Real length = 0;  // m
  std::vector<AnalysisPoint> points;
  std::vector<PointInfluenceLines> at_points;   // parallel to points
  std::vector<SupportInfluenceLines> supports;  // restrained support lines only, left to right
  std::size_t support_lines = 0;                // all support lines, free ones included

  // Reaction curves of a support line; nullptr for a free one.
  [[nodiscard]] const SupportInfluenceLines* support(std::size_t support_line) const;
};

enum class ShearSide { none, left, right };

// Ordinate of `curve` for a unit load at x: curve.value(x), except for a shear
// curve (side left or right) with the load exactly at its own section
// (|x - section| <= tolerance), where the rule above applies.
[[nodiscard]] Real point_load_ordinate(const PiecewiseCubic& curve, ShearSide side, Real section, Real x,
                                       Real tolerance);

[[nodiscard]] InfluenceLines compute_influence_lines(const LineGirderModel& model,
                                                     const InfluenceLineOptions& options = {});

// True when `a` and `b` are the same influence lines bit for bit: the same
// bridge, length, support lines, analysis points (stations, spans, labels and
// flags) and every curve identical (piecewise_cubic.h). Anything computed
// from one set of lines alone, such as its moving-load envelopes, then holds
// for the other. Never approximate: lines equal only to rounding differ.
[[nodiscard]] bool identical(const InfluenceLines& a, const InfluenceLines& b);

}  // namespace tenthpoint::analysis
