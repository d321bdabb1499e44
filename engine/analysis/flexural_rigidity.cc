#include "engine/analysis/flexural_rigidity.h"

#include <cassert>
#include <cmath>

namespace tenthpoint::analysis {

FlexuralRigidity FlexuralRigidity::uniform(Real length, Real ei) {
  FlexuralRigidity rigidity;
  rigidity.then_prismatic(length, ei);
  return rigidity;
}

FlexuralRigidity& FlexuralRigidity::then_prismatic(Real length, Real ei) {
  RigiditySegment segment;
  segment.start = end();
  segment.end = segment.start + length;
  segment.constant = ei;
  segments.push_back(std::move(segment));
  return *this;
}

FlexuralRigidity& FlexuralRigidity::then_varying(Real length, std::function<Real(Real)> ei,
                                                 std::vector<Real> breakpoints) {
  RigiditySegment segment;
  segment.start = end();
  segment.end = segment.start + length;
  segment.varying = std::move(ei);
  segment.breakpoints = std::move(breakpoints);
  segments.push_back(std::move(segment));
  return *this;
}

std::size_t FlexuralRigidity::segment_at(Real station) const {
  assert(!segments.empty());
  for (std::size_t i = 0; i < segments.size(); ++i) {
    if (station <= segments[i].end) return i;
  }
  return segments.size() - 1;
}

std::function<Real(Real)> cubic_depth_haunch(Real x0, Real x1, Real ei0, Real depth_ratio, int shape) {
  assert(x1 != x0 && depth_ratio > 0.0 && (shape == 1 || shape == 2));
  return [=](Real x) {
    const Real u = (x - x0) / (x1 - x0);
    const Real depth = 1.0 + (depth_ratio - 1.0) * (shape == 1 ? u : u * u);
    return ei0 * depth * depth * depth;
  };
}

}  // namespace tenthpoint::analysis
