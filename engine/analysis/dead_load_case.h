// DeadLoadCase: the permanent loads of one component (DC1, DC2, DW, ...) on
// one girder line. Each component is analysed on the structural system of
// its own stage: the caller builds one LineGirderModel per stage (e.g. with
// hinges over the piers and noncomposite EI for DC1; continuous with
// long-term composite EI for DC2 and DW) and passes the matching model.
//
// Units and signs: stations in m from the left end of the girder;
// intensities in N/m and forces in N, positive downward (gravity).
#pragma once

#include <string>
#include <utility>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

struct DistributedLoad {
  Real start = 0;      // m
  Real end = 0;        // m, > start
  Real intensity = 0;  // N/m, downward positive
};

struct ConcentratedLoad {
  Real station = 0;   // m
  Real force = 0;     // N, downward positive
  std::string label;  // e.g. "diaphragm"
};

struct DeadLoadCase {
  DeadLoadCase() = default;
  explicit DeadLoadCase(std::string case_name) : name(std::move(case_name)) {}

  std::string name;
  Real uniform = 0;  // N/m over the whole girder, downward positive
  std::vector<DistributedLoad> distributed;
  std::vector<ConcentratedLoad> concentrated;

  DeadLoadCase& add_uniform(Real intensity) {
    uniform += intensity;
    return *this;
  }
  DeadLoadCase& add_partial(Real start, Real end, Real intensity) {
    distributed.push_back({start, end, intensity});
    return *this;
  }
  DeadLoadCase& add_point(Real station, Real force, std::string label = {}) {
    concentrated.push_back({station, force, std::move(label)});
    return *this;
  }

  // Every load as distributed + concentrated parts on [0, length], the uniform
  // one as a distributed load over the whole girder. Throws ModelError (with
  // bridge_id) when a load is not finite, is empty or reversed, or lies off
  // the girder (beyond `tolerance` m); stations are clamped onto the girder.
  [[nodiscard]] DeadLoadCase normalized(const std::string& bridge_id, Real length, Real tolerance) const;
};

}  // namespace tenthpoint::analysis
