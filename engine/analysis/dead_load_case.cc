#include "engine/analysis/dead_load_case.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::analysis {

DeadLoadCase DeadLoadCase::normalized(const std::string& bridge_id, Real length, Real tolerance) const {
  auto fail = [&](const std::string& cause) {
    throw ModelError(bridge_id, fmt::format("dead load '{}': {}", name, cause));
  };
  auto on_girder = [&](Real x) { return std::isfinite(x) && x >= -tolerance && x <= length + tolerance; };
  DeadLoadCase out;
  out.name = name;
  if (!std::isfinite(uniform)) fail("the uniform intensity is not finite");
  if (uniform != 0.0) out.distributed.push_back({0.0, length, uniform});
  for (const DistributedLoad& d : distributed) {
    if (!std::isfinite(d.intensity)) fail("a distributed intensity is not finite");
    if (!on_girder(d.start) || !on_girder(d.end)) {
      fail(fmt::format("the distributed load from {} m to {} m is not on the girder (0 to {} m)", d.start, d.end,
                       length));
    }
    if (!(d.end > d.start)) fail(fmt::format("the distributed load from {} m to {} m is empty", d.start, d.end));
    out.distributed.push_back({std::clamp(d.start, Real{0}, length), std::clamp(d.end, Real{0}, length), d.intensity});
  }
  for (const ConcentratedLoad& c : concentrated) {
    if (!std::isfinite(c.force)) fail("a concentrated force is not finite");
    if (!on_girder(c.station)) {
      fail(fmt::format("the concentrated load at {} m is not on the girder (0 to {} m)", c.station, length));
    }
    out.concentrated.push_back({std::clamp(c.station, Real{0}, length), c.force, c.label});
  }
  return out;
}

}  // namespace tenthpoint::analysis
