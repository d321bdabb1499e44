// The lever rule (AASHTO LRFD 4.6.2.2.2d and C4.6.2.2.1; Std. Spec.
// 3.23.2.3.1): the deck is taken as hinged at the girders next to the one
// considered, and the girder's share of the wheel loads follows by statics.
// Each truck is two wheel lines `wheel_gauge` apart, each half a lane; trucks
// side by side keep `adjacent_truck_gap` between their nearest wheels.
//
// Results are static lanes per girder with 1, 2, ... trucks side by side, no
// multiple-presence factor or lane reduction applied (apply_lane_factors
// does that). Lengths are m.
#pragma once

#include <optional>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/distribution/distribution_options.h"

namespace tenthpoint::distribution {

struct LeverRule {
  // Index k holds the reaction with k + 1 trucks, lanes per girder.
  std::vector<Real> reaction_by_trucks;
};

// Exterior girder: hinge at the first interior girder `spacing` away; the
// barrier face lies `curb_distance` (de, positive when the face is outboard
// of the exterior web) beyond the girder, and the outer wheel sits
// options.wheel_to_barrier inside the face. Precondition: spacing > 0,
// max_trucks >= 1.
[[nodiscard]] LeverRule exterior_lever_rule(Real spacing, Real curb_distance, int max_trucks,
                                            const DistributionOptions& options);

// Interior girder: hinges at both neighbours, `spacing_left` and
// `spacing_right` away; the trucks are placed for the largest reaction
// without regard to the barriers.
[[nodiscard]] LeverRule interior_lever_rule(Real spacing_left, Real spacing_right, int max_trucks,
                                            const DistributionOptions& options);

// A factored lever-rule (or rigid-body) result: the one-lane value with its
// factor, and the largest of 2 .. max trucks with the factor of that count.
struct FactoredLanes {
  Real one_lane = 0;
  Real one_lane_factor = 0;
  std::optional<Real> multi_lane;  // absent with a single truck
  Real multi_lane_factor = 0;
  int multi_lane_trucks = 0;
};

// Applies factors[k] (k + 1 trucks; the last entry for more) to each
// reaction. Precondition: factors not empty.
[[nodiscard]] FactoredLanes apply_lane_factors(const std::vector<Real>& reaction_by_trucks,
                                               const std::vector<Real>& factors);

// LRFD 4.6.2.2.2d-1, the rigid-body reaction of the exterior girder,
// R = NL/Nb + X_ext * sum(e) / sum(x^2), for 1, 2, ... trucks (lanes). The
// girders are `girders` lines at equal `spacing`; each truck sits in its own
// design lane, lanes laid out from the barrier face, the outer wheel
// options.wheel_to_barrier inside its lane's outer edge. Precondition:
// girders >= 2.
[[nodiscard]] LeverRule rigid_body_reaction(int girders, Real spacing, Real curb_distance, int max_trucks,
                                            const DistributionOptions& options);

}  // namespace tenthpoint::distribution
