#include "engine/distribution/lever_rule.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <functional>

namespace tenthpoint::distribution {
namespace {

// Wheel positions of `trucks` trucks side by side, relative to the first wheel.
std::vector<Real> wheel_offsets(int trucks, const DistributionOptions& options) {
  std::vector<Real> offsets;
  const Real pitch = options.wheel_gauge + options.adjacent_truck_gap;
  for (int k = 0; k < trucks; ++k) {
    offsets.push_back(k * pitch);
    offsets.push_back(k * pitch + options.wheel_gauge);
  }
  return offsets;
}

// The largest sum of influence ordinates over placements of the wheel group
// with its first wheel at or beyond `first_min`. The influence line is
// piecewise linear, so the maximum lies at the bound or with some wheel on a
// breakpoint; every such placement is tried.
Real best_placement(const std::function<Real(Real)>& influence, const std::vector<Real>& breakpoints,
                    const std::vector<Real>& offsets, Real first_min) {
  std::vector<Real> starts{first_min};
  for (Real b : breakpoints) {
    for (Real o : offsets) {
      if (b - o >= first_min) starts.push_back(b - o);
    }
  }
  Real best = 0;
  for (Real t : starts) {
    Real sum = 0;
    for (Real o : offsets) sum += influence(t + o);
    best = std::max(best, sum);
  }
  return 0.5 * best;  // each wheel line is half a lane
}

}  // namespace

LeverRule exterior_lever_rule(Real spacing, Real curb_distance, int max_trucks, const DistributionOptions& options) {
  assert(spacing > 0 && max_trucks >= 1);
  // x from the exterior girder toward the interior: statics of the deck span
  // hinged at the first interior girder, cantilevered over the overhang.
  auto influence = [spacing](Real x) { return x < spacing ? (spacing - x) / spacing : 0.0; };
  const Real first_min = -curb_distance + options.wheel_to_barrier;
  LeverRule out;
  for (int n = 1; n <= max_trucks; ++n) {
    out.reaction_by_trucks.push_back(best_placement(influence, {spacing}, wheel_offsets(n, options), first_min));
  }
  return out;
}

LeverRule interior_lever_rule(Real spacing_left, Real spacing_right, int max_trucks,
                              const DistributionOptions& options) {
  assert(spacing_left > 0 && spacing_right > 0 && max_trucks >= 1);
  auto influence = [spacing_left, spacing_right](Real x) {
    if (x <= -spacing_left || x >= spacing_right) return 0.0;
    return x < 0 ? 1.0 + x / spacing_left : 1.0 - x / spacing_right;
  };
  LeverRule out;
  for (int n = 1; n <= max_trucks; ++n) {
    const auto offsets = wheel_offsets(n, options);
    const Real lowest = -spacing_left - offsets.back();
    out.reaction_by_trucks.push_back(best_placement(influence, {-spacing_left, 0.0, spacing_right}, offsets, lowest));
  }
  return out;
}

FactoredLanes apply_lane_factors(const std::vector<Real>& reaction_by_trucks, const std::vector<Real>& factors) {
  assert(!factors.empty() && !reaction_by_trucks.empty());
  auto factor = [&factors](std::size_t k) { return factors[std::min(k, factors.size() - 1)]; };
  FactoredLanes out;
  out.one_lane_factor = factor(0);
  out.one_lane = reaction_by_trucks[0] * out.one_lane_factor;
  for (std::size_t k = 1; k < reaction_by_trucks.size(); ++k) {
    const Real value = reaction_by_trucks[k] * factor(k);
    if (!out.multi_lane || value > *out.multi_lane) {
      out.multi_lane = value;
      out.multi_lane_factor = factor(k);
      out.multi_lane_trucks = static_cast<int>(k + 1);
    }
  }
  return out;
}

LeverRule rigid_body_reaction(int girders, Real spacing, Real curb_distance, int max_trucks,
                              const DistributionOptions& options) {
  assert(girders >= 2 && spacing > 0 && max_trucks >= 1);
  // Girders at x_i about the centroid of the girder group (LRFD C4.6.2.2.2d).
  const Real x_ext = 0.5 * (girders - 1) * spacing;
  Real sum_x2 = 0;
  for (int i = 0; i < girders; ++i) {
    const Real x = -x_ext + i * spacing;
    sum_x2 += x * x;
  }
  const Real barrier = x_ext + curb_distance;
  LeverRule out;
  Real sum_e = 0;
  for (int n = 1; n <= max_trucks; ++n) {
    // Truck n's resultant: lane n's outer edge, plus the wheel offset, plus half the gauge.
    sum_e += barrier - (n - 1) * options.design_lane_width - options.wheel_to_barrier - 0.5 * options.wheel_gauge;
    out.reaction_by_trucks.push_back(static_cast<Real>(n) / girders + x_ext * sum_e / sum_x2);
  }
  return out;
}

}  // namespace tenthpoint::distribution
