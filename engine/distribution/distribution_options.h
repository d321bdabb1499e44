// Choices the distribution of live load to girders leaves to the agency: the
// multiple-presence factors and lane reductions (taken from the policy), the
// wheel placement of the lever rule, and where the skew corrections apply.
// Lengths are m. Defaults are stated beside each field; validate once with
// is_valid before use.
#pragma once

#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/units.h"
#include "engine/model/policy.h"
#include "engine/section/section_options.h"

namespace tenthpoint::distribution {

struct DistributionOptions {
  // m for 1, 2, 3, ... loaded lanes, the last for more (LRFD Table
  // 3.6.1.1.2-1). Take it from model::Policy::lrfr.multiple_presence
  // (from_policy below); required, not defaulted here.
  std::vector<Real> multiple_presence;
  // LFR reduction for several loaded lanes, 1, 2, 3, ... lanes (Std. Spec.
  // 3.12.1), from model::Policy::lfr.multiple_lane_reduction.
  std::vector<Real> lfr_lane_reduction;

  // Lever rule and rigid-body placement of the design truck.
  Real wheel_gauge = 6.0 * units::kFoot;         // LRFD 3.6.1.2.2: wheels 6 ft apart
  Real wheel_to_barrier = 2.0 * units::kFoot;    // LRFD 3.6.1.3.1: wheel centre 2 ft from the barrier face
  Real adjacent_truck_gap = 4.0 * units::kFoot;  // wheels of trucks in adjacent lanes, 2 ft + 2 ft from
                                                 // the lane line (LRFD 3.6.1.3.1, from memory)
  Real design_lane_width = 12.0 * units::kFoot;  // LRFD 3.6.1.1.1

  // LRFD 4.6.2.2.3c: the shear correction is for the exterior girder at the
  // obtuse corner; true (common practice) applies it to the shear factor of
  // every girder line over the whole span, which is conservative for
  // interior girders and for points away from the supports.
  bool skew_shear_on_all_girders = true;
  // LRFD 4.6.2.2.2d: the rigid-body check for exterior girders of steel
  // beam-slab bridges with diaphragms or cross-frames (brace_stations given).
  bool rigid_body_check = true;

  // How n is computed for Kg when the bridge file gives none.
  section::SectionOptions section;

  // m for `lanes` (>= 1) loaded lanes.
  [[nodiscard]] Real multiple_presence_for(int lanes) const;
  // LFR lane reduction for `lanes` (>= 1) loaded lanes; 1.0 when none given.
  [[nodiscard]] Real lfr_lane_reduction_for(int lanes) const;

  // True when the options are usable; otherwise false with the reason in *why
  // (when why is not null).
  [[nodiscard]] bool is_valid(std::string* why) const;

  // Defaults with m and the LFR reductions from the policy.
  [[nodiscard]] static DistributionOptions from_policy(const model::Policy& policy);
};

}  // namespace tenthpoint::distribution
