// A brute-force moving-load envelope for the benchmark to compare against:
// every lead-axle position on a fixed grid, and for a chain with a variable
// link (spacing or gap) every value of that link on the same grid, read
// straight from the analysis curves with analysis::point_load_ordinate; lane
// loads by the trapezoidal rule on the same grid, concentrated lane loads at
// the largest sampled ordinate. Supports chains with at most one variable
// link (every chain of the shipped library).
#pragma once

#include <vector>

#include "engine/core/numeric.h"
#include "engine/live_load/moving_load_envelope.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::bench {

// Static per-lane train and lane parts of every case and effect, parallel to
// MovingLoadEnvelope::cases[c].values; NaN where the case does not apply.
struct SampledCaseValues {
  live_load::EffectTable<Real> train;
  live_load::EffectTable<Real> lane;
};

struct SampledEnvelope {
  std::vector<SampledCaseValues> cases;
};

// `step` in m. The analytic envelope gives the case list and applicability.
[[nodiscard]] SampledEnvelope sampled_envelope(const live_load::PreparedInfluenceLines& lines,
                                               const model::LoadModel& model,
                                               const live_load::MovingLoadEnvelope& analytic, Real step);

}  // namespace tenthpoint::bench
