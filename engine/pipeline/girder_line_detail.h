// GirderLineDetail: what a per-bridge results document needs of one girder
// line beyond its rating factors: the analysis points, the dead-load effects
// per component at the points, and per load model the static per-lane
// envelopes (the governing case's train part, lane part and sum, with the
// train's placement) and the distributed envelopes per girder after dynamic
// allowance, plus the distribution factors and dynamic allowance used at each
// point. It is a compact copy, not the full MovingLoadEnvelope: one governing
// case per effect, extreme and point, so that a batch of many bridges holds
// little memory per bridge (the detail is owned by BridgeRating and freed
// with it).
//
// Effects per point: moment, shear just left and just right of the point
// (engine/live_load/effect_table.h); reactions are not kept (not rated).
// Units internal SI: stations m, moments N*m, shears N; signs as
// analysis::InfluenceLines (sagging moment positive; shear = resultant of
// the forces left of the cut, upward positive).
#pragma once

#include <array>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "engine/analysis/analysis_point.h"
#include "engine/analysis/girder_line_analysis.h"
#include "engine/live_load/moving_load_envelope.h"
#include "engine/live_load/train_placement.h"
#include "engine/model/enums.h"
#include "engine/rating/girder_rating.h"

namespace tenthpoint::pipeline {

// Dead-load effects of one component on its own structural system, per
// analysis point.
struct ComponentAtPoints {
  model::DeadLoadComponent component = model::DeadLoadComponent::dc1;
  std::vector<Real> moment;       // N*m
  std::vector<Real> shear_left;   // N
  std::vector<Real> shear_right;  // N
};

// One case of a load model as the envelope loaded it.
struct EnvelopeCase {
  std::string case_id;
  std::optional<live_load::AxleChain> chain;  // absent for a lane-only case
  bool has_lane = false;
};

// One effect and extreme at one point.
struct EnvelopeEntry {
  // Static per lane, the case with the most adverse static sum
  // (MovingLoadEnvelope::governing); -1 where no case applies.
  std::int32_t static_case = -1;
  Real train = 0;                                      // the train alone of that case (0 for a lane-only case)
  Real lane = 0;                                       // the lane alone of that case (0 without a lane)
  Real total = 0;                                      // train + lane
  std::optional<live_load::TrainPlacement> placement;  // where the train stands; absent when it carries nothing
  // Per girder after dynamic allowance, the most adverse over the cases:
  // g [(1 + IM) train + (1 + IM_lane) lane]; -1 where no case applies.
  std::int32_t distributed_case = -1;
  Real distributed = 0;
};

struct LoadModelEnvelope {
  std::string load_model_id;
  std::vector<EnvelopeCase> cases;
  // Per analysis point, maximum and minimum.
  std::vector<live_load::ExtremePair<EnvelopeEntry>> moment;
  std::vector<live_load::ExtremePair<EnvelopeEntry>> shear_left;
  std::vector<live_load::ExtremePair<EnvelopeEntry>> shear_right;
};

struct GirderLineDetail {
  std::string girder_id;
  std::vector<analysis::AnalysisPoint> points;
  std::vector<ComponentAtPoints> dead_loads;  // DC1, DC2, DW
  rating::GirderDistribution distribution;    // lanes per girder at each point, as rated
  rating::DynamicAllowanceAt impact;          // IM (LRFR) or I (LFR) at each point, as rated
  std::vector<LoadModelEnvelope> envelopes;   // in the order of the rated load models
};

// Builds the detail of one girder line from what rate_bridge computed for it.
// `envelopes` are the moving-load envelopes of the rated load models, in order.
[[nodiscard]] GirderLineDetail girder_line_detail(const analysis::GirderLineAnalysis& analysis,
                                                  const std::vector<live_load::MovingLoadEnvelope>& envelopes,
                                                  const rating::GirderDistribution& distribution,
                                                  const rating::DynamicAllowanceAt& impact);

}  // namespace tenthpoint::pipeline
