#include "engine/distribution/distribution_options.h"

#include <algorithm>
#include <cassert>

namespace tenthpoint::distribution {
namespace {

Real pick(const std::vector<Real>& table, int lanes) {
  assert(lanes >= 1 && !table.empty());
  const auto i = std::min<std::size_t>(static_cast<std::size_t>(lanes - 1), table.size() - 1);
  return table[i];
}

bool fail(std::string* why, const char* message) {
  if (why != nullptr) *why = message;
  return false;
}

}  // namespace

Real DistributionOptions::multiple_presence_for(int lanes) const { return pick(multiple_presence, lanes); }

Real DistributionOptions::lfr_lane_reduction_for(int lanes) const {
  return lfr_lane_reduction.empty() ? 1.0 : pick(lfr_lane_reduction, lanes);
}

bool DistributionOptions::is_valid(std::string* why) const {
  if (multiple_presence.empty()) return fail(why, "multiple_presence is empty: take it from the policy");
  for (Real m : multiple_presence) {
    if (!(m > 0)) return fail(why, "multiple_presence factors must be positive");
  }
  for (Real r : lfr_lane_reduction) {
    if (!(r > 0)) return fail(why, "lfr_lane_reduction factors must be positive");
  }
  if (!(wheel_gauge > 0)) return fail(why, "wheel_gauge must be positive");
  if (!(wheel_to_barrier >= 0)) return fail(why, "wheel_to_barrier must not be negative");
  if (!(adjacent_truck_gap >= 0)) return fail(why, "adjacent_truck_gap must not be negative");
  if (!(design_lane_width > wheel_gauge)) return fail(why, "design_lane_width must exceed wheel_gauge");
  return section.is_valid(why);
}

DistributionOptions DistributionOptions::from_policy(const model::Policy& policy) {
  DistributionOptions options;
  options.multiple_presence = policy.lrfr.multiple_presence;
  options.lfr_lane_reduction = policy.lfr.multiple_lane_reduction;
  return options;
}

}  // namespace tenthpoint::distribution
