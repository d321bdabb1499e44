// A girder line: one group of identical girders (all interiors, or the two
// exteriors) and the sections along it. Every girder of a group is rated the
// same way; `count` says how many girders the group stands for.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

// A stretch of girder between two stations [m from the start of the girder,
// the centreline of bearing at the first support]. A prismatic segment names
// one section; a non-prismatic (haunched) segment names the section at each
// end and how the depth varies between them.
struct Segment {
  Real start = 0;                          // m
  Real end = 0;                            // m, > start
  std::string section;                     // section at `start` (the whole segment if prismatic)
  std::optional<std::string> end_section;  // section at `end`; set only for a non-prismatic segment
  std::optional<Taper> taper;              // set exactly when end_section is set
  SourceLocation where;

  [[nodiscard]] bool prismatic() const { return !end_section.has_value(); }
};

struct GirderLine {
  std::string id;
  GirderPosition position = GirderPosition::interior;
  int count = 1;
  Real spacing = 0;                   // m, centre-to-centre to the adjacent girder
  std::optional<Real> overhang;       // m, exterior girder centreline to deck edge
  std::optional<Real> curb_distance;  // m, de: exterior web centreline to inside of barrier (LRFD 4.6.2.2.2d)
  std::vector<Segment> segments;      // ordered, covering [0, total length] without gap or overlap
  std::vector<Real> brace_stations;   // m, cross-frames/diaphragms bracing the compression flange
  SourceLocation where;
};

}  // namespace tenthpoint::model
