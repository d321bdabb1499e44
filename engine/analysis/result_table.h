// ResultTable: analysis results as plain tables (named columns of numbers,
// one label per row) that a writer can emit as CSV or JSON. Files are not
// written here; the command-line front end does that.
//
// Units are the engine's (SI) and are named in every column heading, e.g.
// "station [m]", "moment [N*m]". Influence-line ordinates are per newton of
// unit load: moment [m], shear and reaction [N/N], deflection [m/N].
#pragma once

#include <string>
#include <vector>

#include "engine/analysis/analysis_point.h"
#include "engine/analysis/dead_load_effects.h"
#include "engine/analysis/influence_lines.h"
#include "engine/analysis/piecewise_cubic.h"

namespace tenthpoint::analysis {

struct ResultTable {
  std::string title;
  std::vector<std::string> columns;
  std::vector<std::string> row_labels;  // empty, or one per row
  std::vector<std::vector<Real>> rows;
};

// An influence line with a name a person can read and the unit of its ordinates.
struct NamedCurve {
  std::string name;                       // e.g. "moment at span 1 0.4L"
  std::string unit;                       // e.g. "m"
  const PiecewiseCubic* curve = nullptr;  // points into the InfluenceLines it came from
  // The same, broken down for writers that convert units or group curves:
  // effect is one of moment, shear, shear_left, shear_right, deflection,
  // reaction, support_moment; `where` labels the point or support line.
  std::string effect;
  std::string where;
  Real station = 0;  // m, of the point or support line
};

// Every curve of a set: for each point moment, shear left, shear right (once
// where they are the same curve), deflection when computed; then every
// support's reaction and moment.
[[nodiscard]] std::vector<NamedCurve> named_curves(const InfluenceLines& lines);

// Columns "station [m]" and "<name> [unit]": every knot (twice where the curve
// jumps, left limit first) and `interior_points` points inside each piece.
[[nodiscard]] ResultTable sampled_table(const NamedCurve& curve, int interior_points);

// The exact pieces: columns start [m], end [m], c0..c3 (p = sum c_k (x - start)^k).
[[nodiscard]] ResultTable piece_table(const NamedCurve& curve);

// One row per analysis point (labelled): station, span (1-based), span
// fraction, moment, shear left, shear right.
[[nodiscard]] ResultTable dead_load_point_table(const std::vector<AnalysisPoint>& points,
                                                const DeadLoadEffects& effects);

// One row per support line (labelled "support k"): station, reaction, support moment.
[[nodiscard]] ResultTable dead_load_reaction_table(const std::vector<AnalysisPoint>& points,
                                                   const DeadLoadEffects& effects);

}  // namespace tenthpoint::analysis
