// Influence lines and dead-load diagrams of a girder line as data for people:
// CSV (one long table) or JSON, in the bridge file's own unit system, so an
// engineer can plot them or check an ordinate by hand.
//
// Curves are written at their knots (both limits where they jump) plus
// `interior_points` equally spaced points inside every piece; the ordinates
// are exact values of the piecewise cubics, not interpolations.
//
// Units in the output (US / SI): stations ft / m; moment influence ordinates
// kip-ft per kip = ft / m; shear and reaction ordinates dimensionless;
// dead-load moments kip-ft / kN-m; shears and reactions kip / kN.
// Signs: as engine/analysis/influence_lines.h (sagging moment positive; shear
// = resultant of the forces left of the cut, upward positive; reactions upward).
#pragma once

#include <string>
#include <vector>

#include "engine/analysis/girder_line_analysis.h"
#include "engine/core/units.h"

namespace tenthpoint::report {

struct DiagramExportOptions {
  int interior_points = 8;  // samples inside each piece besides its knots
};

// CSV with header
//   girder,kind,curve,point,point_station,x,value,unit
// kind is "influence" or "dead_load"; for influence rows `x` is the unit-load
// station, for dead-load rows the station along the girder.
[[nodiscard]] std::string diagrams_csv(const std::vector<analysis::GirderLineAnalysis>& girders,
                                       units::UnitSystem system, const DiagramExportOptions& options = {});

// The same content as one JSON document, with a "units" table and, per
// girder line, its analysis points, influence lines and dead-load effects at
// the points.
[[nodiscard]] std::string diagrams_json(const std::vector<analysis::GirderLineAnalysis>& girders,
                                        units::UnitSystem system, const DiagramExportOptions& options = {});

}  // namespace tenthpoint::report
