// GirderRating: rating factors at every analysis point of one girder line
// for every load model, from the stage results already computed: dead-load
// effects per component (analysis), per-lane static live-load envelopes
// (live_load), distribution factors and dynamic allowance, and the
// capacities along the girder (capacity).
//
// Effects rated at each analysis point (Strength I; MBE 6A.4.2, 6B.4):
//   positive_moment  the maximum (sagging) moment envelope, capacity phi Mn+;
//   negative_moment  the minimum (hogging) envelope, capacity phi Mn-;
//   shear            both extremes of shear just left and just right of the
//                    point (the governing of the four), capacity phi Vn.
// Dead loads act with their own sign: where the dead-load effect opposes the
// live load it enters as a negative (relieving) magnitude with the same
// factor (common practice; a policy may later ask for 0.9 or 1.0 instead).
//
// Live load per girder: LL + IM = g [ (1 + IM) * train + (1 + IM_lane) * lane ],
// the governing case being chosen after IM (the static governing case can
// differ). IM_lane is 0 for LRFR (LRFD 3.6.2.1) and the impact fraction I for
// LFR (Standard Specifications 3.8.2: impact on truck and lane loading).
//
// Units: internal SI (moments N*m, shears N); rating factors dimensionless.
// Service limit states (Service II for steel, Service III for prestressed
// concrete) are not rated here yet.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/analysis/girder_line_analysis.h"
#include "engine/capacity/condition_system_factors.h"
#include "engine/capacity/girder_capacity.h"
#include "engine/live_load/moving_load_envelope.h"
#include "engine/model/policy.h"
#include "engine/model/vehicle.h"
#include "engine/rating/load_factors.h"
#include "engine/rating/rating_factor.h"

namespace tenthpoint::rating {

enum class RatedEffect { positive_moment, negative_moment, shear };

[[nodiscard]] std::string_view to_string(RatedEffect effect);

// Lanes per girder for this girder line, multiple presence included, per
// analysis point and effect (factors differ by span and, for negative
// moment, by support).
struct GirderDistribution {
  std::vector<Real> moment_positive;  // per analysis point
  std::vector<Real> moment_negative;
  std::vector<Real> shear;

  [[nodiscard]] static GirderDistribution uniform(std::size_t points, Real moment_positive, Real moment_negative,
                                                  Real shear);
};

// Dynamic allowance as a fraction, per analysis point and effect (LFR impact
// varies with the loaded length; LRFR uses one value).
struct DynamicAllowanceAt {
  std::vector<Real> positive_moment;  // per analysis point
  std::vector<Real> negative_moment;
  std::vector<Real> shear;
  bool applies_to_lane = false;  // LFR: true; LRFR: false

  [[nodiscard]] static DynamicAllowanceAt uniform(std::size_t points, Real im, bool applies_to_lane);
};

struct RatedLoadModel {
  const model::LoadModel* model = nullptr;
  const live_load::MovingLoadEnvelope* envelope = nullptr;
};

struct GirderRatingInputs {
  model::RatingMethod method = model::RatingMethod::lrfr;
  model::MaterialKind material = model::MaterialKind::rolled_steel;  // concrete shear takes the demand
  const analysis::GirderLineAnalysis* analysis = nullptr;
  const capacity::GirderCapacity* capacity = nullptr;
  const model::Policy* policy = nullptr;
  capacity::ConditionSystemFactors moment_factors;  // phi_c phi_s for flexure
  capacity::ConditionSystemFactors shear_factors;   // phi_c phi_s for shear
  GirderDistribution distribution;
  DynamicAllowanceAt impact;
  std::optional<Real> adtt;
  bool wearing_surface_field_measured = false;
  std::vector<RatedLoadModel> load_models;
};

// One rating factor with everything a person needs to check it.
struct PointRating {
  std::size_t point = 0;
  Real station = 0;  // m
  std::string label;
  RatedEffect effect = RatedEffect::positive_moment;
  std::string side;  // "left"/"right" of the point for shear; "" for moment
  LimitState limit_state = LimitState::strength_i;
  model::RatingLevel level = model::RatingLevel::inventory;
  RatingFactorResult result;
  Real capacity_factor = 1;  // phi_c phi_s (LRFR); 1 for LFR
  Real resistance = 0;       // phi Rn before phi_c phi_s, N*m or N
  std::string resistance_article;
  Real distribution = 0;  // lanes per girder
  Real impact = 0;        // IM or I as a fraction
  Real gamma_ll = 0;      // or A2
  std::string case_id;    // the load case that governs after IM
};

struct LevelRating {
  model::RatingLevel level = model::RatingLevel::inventory;
  std::string factor_source;             // where gamma_LL (or A2) came from
  std::vector<PointRating> points;       // every rated point and effect
  std::optional<PointRating> governing;  // the smallest rated RF
};

struct LoadModelRating {
  std::string load_model_id;
  std::string name;
  model::VehicleCategory category = model::VehicleCategory::design;
  std::optional<Real> rating_weight;  // W, N
  std::vector<LevelRating> levels;    // design: inventory and operating; others: operating
  std::vector<std::string> warnings;
};

struct GirderRating {
  std::string girder_id;
  int girder_count = 1;
  std::vector<LoadModelRating> load_models;
  std::vector<std::string> warnings;  // capacities unavailable, and the like
};

// The rating levels a load model is rated at (MBE 6A.4.3-6A.4.5, 6B):
// design loads at inventory and operating; legal, specialized hauling,
// permit and emergency loads at operating only.
[[nodiscard]] std::vector<model::RatingLevel> rating_levels(model::VehicleCategory category);

[[nodiscard]] GirderRating rate_girder_line(const GirderRatingInputs& inputs);

}  // namespace tenthpoint::rating
