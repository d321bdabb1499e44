// AnalysisPoint: a station of the girder at which effects are reported.
//
// The model generates them: the tenth points of every span, every support
// line, every hinge, every change of section (a rigidity segment boundary)
// and every named point of the layout. Points closer together than
// ModelOptions::station_tolerance are one point carrying all their labels.
// Labels number spans and supports from 1, as people do ("span 2 0.4L",
// "support 3"); indices in code are 0-based.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

struct AnalysisPoint {
  Real station = 0;                    // m from the left end of the girder
  std::size_t span = 0;                // 0-based span holding the point (see GirderLayout::span_at)
  Real span_fraction = 0;              // (station - span start) / span length, in [0, 1]
  std::optional<std::size_t> support;  // 0-based support line at this station
  std::optional<int> tenth;            // k when the point is the k/10 point of `span`
  bool hinge = false;
  bool section_change = false;
  std::vector<std::string> labels;

  // All labels joined by " / ".
  [[nodiscard]] std::string label() const {
    std::string out;
    for (const std::string& l : labels) {
      if (!out.empty()) out += " / ";
      out += l;
    }
    return out;
  }
};

}  // namespace tenthpoint::analysis
