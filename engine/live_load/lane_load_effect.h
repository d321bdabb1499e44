// LaneLoadEffect: the extreme effect of a lane load on one influence line.
//
// Uniform part (AASHTO LRFD 3.6.1.2.4, 3.6.1.3.1; Standard Specifications
// 3.11.3): the load covers exactly the parts of the girder where the
// ordinate has the sign sought (patches may be discontinuous), so the effect
// is intensity x the exact positive (maximum) or negative (minimum) area.
//
// Concentrated loads of the LFR lane loading (Standard Specifications
// 3.7.1.2): one load at the extreme ordinate of that sign (the moment load for
// moments; the shear load for shears and, by common practice, reactions).
// For negative moment on a continuous girder, when the case asks for it, a
// second load of the moment weight stands at the extreme ordinate in one other
// span (Standard Specifications 3.11.3, from memory): the span, other than
// the first load's, with the most adverse ordinate.
//
// The lane's factor (0.90 for HL-93's two-truck case) multiplies the uniform
// and the concentrated loads. Units: N/m, N, results N x ordinate unit.
#pragma once

#include <array>
#include <cstddef>
#include <optional>

#include "engine/core/numeric.h"
#include "engine/live_load/effect_curve.h"
#include "engine/live_load/effect_table.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load {

struct PlacedLoad {
  Real force = 0;    // N, factored
  Real station = 0;  // m
  Approach approach = Approach::exact;
};

struct LaneExtreme {
  Real value = 0;         // uniform + concentrated
  Real uniform = 0;       // intensity x factor x area; the loaded parts are EffectCurve::regions(extreme)
  Real concentrated = 0;  // sum of force x ordinate of the placed loads
  std::array<PlacedLoad, 2> loads{};
  std::size_t load_count = 0;
};

// `kind` chooses the moment or shear concentrated load. An extreme the curve
// never reaches (no area, no ordinate of that sign) gives zero.
[[nodiscard]] LaneExtreme lane_extreme(const EffectCurve& curve, EffectKind kind, Extreme extreme,
                                       const model::LaneLoad& lane,
                                       const std::optional<model::LaneConcentratedLoads>& concentrated);

}  // namespace tenthpoint::live_load
