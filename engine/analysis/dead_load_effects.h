// DeadLoadEffects: moments, shears and reactions of one dead-load case on one
// structural system, at every analysis point of the model.
//
// Two independent routes give the same numbers (tests hold them to each
// other):
//  - solve_dead_load: a direct solve of K u = F with the consistent nodal
//    loads (exact for prismatic elements, where Hermite functions are the
//    exact fixed-end forces), element end forces f = k u + fixed-end forces,
//    and statics between nodes for the diagrams;
//  - dead_load_from_influence_lines: exact integration of the piecewise-cubic
//    influence lines against the loads (sum of P * ordinate plus integrals of
//    w * ordinate).
//
// Units and signs: as InfluenceLines (moment N*m sagging positive; shear N,
// resultant of the forces to the left, upward positive; reactions N upward;
// support moments N*m counterclockwise on the girder). Loads in the case are
// downward positive. A concentrated load standing exactly on an analysis point
// makes the shear jump there: shear_left is the value just left of the point,
// shear_right just right of it (the load is included in shear_right).
//
// Failure: loads off the girder or not finite throw ModelError naming the
// bridge and the case.
#pragma once

#include <string>
#include <vector>

#include "engine/analysis/dead_load_case.h"
#include "engine/analysis/influence_lines.h"
#include "engine/analysis/line_girder_model.h"
#include "engine/analysis/piecewise_cubic.h"

namespace tenthpoint::analysis {

struct DeadLoadEffects {
  std::string case_name;
  std::vector<Real> moment;           // per analysis point, N*m
  std::vector<Real> shear_left;       // per analysis point, N
  std::vector<Real> shear_right;      // per analysis point, N
  std::vector<Real> reactions;        // per support line, N (0 for a free line)
  std::vector<Real> support_moments;  // per support line, N*m (0 unless fixed)
  // Diagrams along the girder as functions of station (m): moment (N*m,
  // quadratic pieces between loads) and shear (N, linear pieces, jumping at
  // concentrated loads and supports; right-continuous). Knots: the mesh
  // nodes plus the ends of distributed loads and the concentrated-load
  // stations. Only solve_dead_load fills them.
  PiecewiseCubic moment_diagram;
  PiecewiseCubic shear_diagram;
};

[[nodiscard]] DeadLoadEffects solve_dead_load(const LineGirderModel& model, const DeadLoadCase& load_case);

[[nodiscard]] DeadLoadEffects dead_load_from_influence_lines(const InfluenceLines& lines,
                                                             const DeadLoadCase& load_case);

}  // namespace tenthpoint::analysis
