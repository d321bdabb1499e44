#include "engine/live_load/train_placement.h"

#include <array>
#include <utility>

namespace tenthpoint::live_load {
namespace {

constexpr std::array<std::pair<TravelDirection, std::string_view>, 2> kDirectionNames{{
    {TravelDirection::rightward, "rightward"},
    {TravelDirection::leftward, "leftward"},
}};

}  // namespace

std::string_view to_string(TravelDirection direction) {
  for (const auto& [value, name] : kDirectionNames)
    if (value == direction) return name;
  return "?";
}

std::optional<TravelDirection> parse_travel_direction(std::string_view text) {
  for (const auto& [value, name] : kDirectionNames)
    if (name == text) return value;
  return std::nullopt;
}

std::vector<Real> placed_spacings(const AxleChain& chain, const TrainPlacement& placement) {
  std::vector<Real> out;
  out.reserve(chain.links.size());
  std::size_t v = 0;
  for (const AxleLink& link : chain.links) out.push_back(link.variable() ? placement.variable_spacings[v++] : link.min);
  return out;
}

std::vector<Real> axle_stations(const AxleChain& chain, const TrainPlacement& placement) {
  const std::vector<Real> s = placed_spacings(chain, placement);
  const Real step = placement.direction == TravelDirection::rightward ? -1.0 : 1.0;
  std::vector<Real> out{placement.lead_station};
  for (Real spacing : s) out.push_back(out.back() + step * spacing);
  return out;
}

Real placed_effect(const EffectCurve& curve, const AxleChain& chain, const TrainPlacement& placement) {
  const std::vector<Real> stations = axle_stations(chain, placement);
  Real sum = 0.0;
  for (std::size_t i = 0; i < stations.size(); ++i) {
    if (placement.is_dropped(i)) continue;
    sum += chain.weights[i] * curve.ordinate(stations[i], placement.approach);
  }
  return sum;
}

}  // namespace tenthpoint::live_load
