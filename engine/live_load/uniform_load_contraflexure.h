// UniformLoadContraflexure: the moment diagram of a unit uniform load on all
// spans of a girder line, and the points of contraflexure it has. AASHTO
// LRFD 3.6.1.3.1 applies the two-truck loading to "negative moment between
// points of contraflexure under a uniform load on all spans"; this is that
// region, computed exactly from the influence lines.
//
// Method: the reactions (and fixed-support moments) under the unit load are
// the integrals of their influence lines; statics then gives the diagram as
// exact quadratic pieces between supports,
//   M(x) = sum over supports s_i < x of [R_i (x - s_i) - C_i] - x^2 / 2,
// with R_i upward and C_i the counterclockwise moment of a fixed support on
// the girder (the sign conventions of analysis::InfluenceLines).
//
// Units: stations m; moments per unit load intensity, N*m per N/m = m^2,
// sagging positive.
#pragma once

#include <vector>

#include "engine/analysis/influence_lines.h"
#include "engine/analysis/piecewise_cubic.h"
#include "engine/core/numeric.h"
#include "engine/live_load/effect_curve.h"

namespace tenthpoint::live_load {

struct UniformLoadContraflexure {
  analysis::PiecewiseCubic moment;         // the diagram, m^2 per unit load
  std::vector<Real> stations;              // points of contraflexure inside the girder, ascending, m
  std::vector<Interval> negative_regions;  // where the diagram is negative (hogging), m
  std::vector<Real> point_moments;         // the diagram at every analysis point, m^2
  std::vector<bool> in_negative_region;    // per analysis point: the diagram is negative there
};

[[nodiscard]] UniformLoadContraflexure uniform_load_contraflexure(const analysis::InfluenceLines& lines);

}  // namespace tenthpoint::live_load
