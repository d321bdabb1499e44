// MovingLoadEnvelope: the exact static envelopes of one load model on one
// girder line, per lane, before dynamic allowance and distribution.
//
// For every case of the model and every effect it applies to (LoadCase
// effects, span condition, contraflexure region), the envelope keeps the
// parts separately: the axle chain alone (AxleTrainSearch: both directions,
// variable spacings and gaps searched exactly, relieving axles dropped where
// the case says), the lane alone (LaneLoadEffect), and their sum. The train
// and the lane are placed independently, each where it is most adverse
// (AASHTO LRFD 3.6.1.3.1: truck or tandem "combined with" the lane load).
// The model's static governing case per effect is the one with the most
// adverse sum; with dynamic allowance the governing case can change, which
// GirderLiveLoad decides.
//
// Units: as InfluenceLines, per lane: moments N*m, shears and reactions N.
// A maximum is never below zero and a minimum never above it (the load can
// always stand off the girder).
//
// Failure: InputError at the case's location for a case that names an
// unknown train or has neither a train nor a lane, and as axle_chain().
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/live_load/axle_chain.h"
#include "engine/live_load/axle_train_search.h"
#include "engine/live_load/effect_table.h"
#include "engine/live_load/lane_load_effect.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "engine/live_load/train_sweep.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load {

struct EnvelopeOptions {
  TrainSearchOptions search;

  [[nodiscard]] bool is_valid(std::string* why) const;
};

// One case's value for one effect and extreme.
struct CaseExtreme {
  std::optional<TrainExtreme> train;  // absent for a lane-only case
  std::optional<LaneExtreme> lane;    // absent for a case without a lane

  [[nodiscard]] Real train_value() const { return train ? train->value : 0.0; }
  [[nodiscard]] Real lane_value() const { return lane ? lane->value : 0.0; }
  [[nodiscard]] Real total() const { return train_value() + lane_value(); }
};

struct CaseEnvelope {
  std::string case_id;
  std::optional<AxleChain> chain;  // the axles as the case loads them
  // The relieving-axle rule the values were found with (AASHTO LRFD
  // 3.6.1.3.1 when drop_relieving).
  AxleRule axle_rule = AxleRule::all_axles;
  std::optional<model::LaneLoad> lane;
  std::optional<model::LaneConcentratedLoads> lane_concentrated;
  // nullopt where the case does not apply.
  EffectTable<std::optional<CaseExtreme>> values;
};

struct MovingLoadEnvelope {
  std::string load_model_id;
  std::vector<CaseEnvelope> cases;  // in the model's order
  // Per effect and extreme: the case with the most adverse static total;
  // nullopt where no case applies.
  EffectTable<std::optional<std::size_t>> governing;

  // The governing case's value there, or nullopt.
  [[nodiscard]] const CaseExtreme* governing_value(const EffectKey& key) const;
};

// True when `load_case` applies to `key` on this girder line.
[[nodiscard]] bool case_applies(const model::LoadCase& load_case, const PreparedInfluenceLines& lines,
                                const EffectKey& key);

[[nodiscard]] MovingLoadEnvelope compute_moving_load_envelope(const PreparedInfluenceLines& lines,
                                                              const model::LoadModel& model,
                                                              const model::VehicleLibrary& library,
                                                              const EnvelopeOptions& options = {});

// Several models at once; chains that appear in more than one model (the
// HL-93 and HS20 trucks) are searched with one set of sweeps.
[[nodiscard]] std::vector<MovingLoadEnvelope> compute_moving_load_envelopes(
    const PreparedInfluenceLines& lines, const std::vector<const model::LoadModel*>& models,
    const model::VehicleLibrary& library, const EnvelopeOptions& options = {});

}  // namespace tenthpoint::live_load
