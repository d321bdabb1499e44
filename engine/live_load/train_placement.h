// TrainPlacement: where an axle chain stands when it produces an envelope
// value, so that a report can draw the vehicle where it governs.
//
// Stations are m from the left end of the girder. `rightward` travel has the
// front axle leading towards increasing station (the rear axles stand to its
// left); `leftward` the reverse. An axle off the girder carries nothing.
#pragma once

#include <array>
#include <cstdint>
#include <optional>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/live_load/axle_chain.h"
#include "engine/live_load/effect_curve.h"

namespace tenthpoint::live_load {

enum class TravelDirection { rightward, leftward };

[[nodiscard]] std::string_view to_string(TravelDirection direction);  // "rightward", "leftward"
[[nodiscard]] std::optional<TravelDirection> parse_travel_direction(std::string_view text);

struct TrainPlacement {
  TravelDirection direction = TravelDirection::rightward;
  Real lead_station = 0;  // m, the front axle of the first train
  // When the value is a one-sided limit at a jump of the influence line (an
  // axle next to a shear section), the chain stands an infinitesimal distance
  // to this side of the stations given.
  Approach approach = Approach::exact;
  // The value taken by each variable link of the chain, in chain order
  // (variable axle spacings and gaps), m.
  std::array<Real, kMaxVariableLinks> variable_spacings{};
  // Bit i set: axle i (chain order) would have relieved the effect and was
  // left off (AASHTO LRFD 3.6.1.3.1).
  std::uint64_t dropped = 0;

  [[nodiscard]] bool is_dropped(std::size_t axle) const { return (dropped >> axle) & 1u; }
};

// The value of every link of `chain` as placed (fixed ones as given), m.
[[nodiscard]] std::vector<Real> placed_spacings(const AxleChain& chain, const TrainPlacement& placement);
// Station of every axle of `chain` as placed, chain order, m.
[[nodiscard]] std::vector<Real> axle_stations(const AxleChain& chain, const TrainPlacement& placement);

// The effect of `chain` placed as stated on `curve`, evaluated directly from
// the exact ordinates (dropped axles left off): a check on the search, and
// what a report can recompute.
[[nodiscard]] Real placed_effect(const EffectCurve& curve, const AxleChain& chain, const TrainPlacement& placement);

}  // namespace tenthpoint::live_load
