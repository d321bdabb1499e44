// GirderRating: rating factors at every analysis point of one girder line
// for every load model, from the stage results already computed: dead-load
// effects per component (analysis), per-lane static live-load envelopes
// (live_load), distribution factors and dynamic allowance, and the
// capacities along the girder (capacity).
//
// Effects rated at each analysis point:
//   positive_moment  the maximum (sagging) moment envelope;
//   negative_moment  the minimum (hogging) envelope;
//   shear            both extremes of shear just left and just right of the
//                    point (the governing of the four), strength only.
// Dead loads act with their own sign: where the dead-load effect opposes the
// live load it enters as a negative (relieving) magnitude with the same
// factor (common practice; a policy may later ask for 0.9 or 1.0 instead).
//
// Limit states (LRFR, MBE Table 6A.4.2.2-1; which ones, see
// rated_limit_states()):
//   Strength I    every load model but permits: C = phi_c phi_s phi Rn;
//   Strength II   permits, gamma_LL from the policy's permit type (MBE Table
//                 6A.4.5.4.2a-1), same dead-load factors as Strength I;
//   Service II    steel, both flanges in positive and negative moment:
//                 RF = (fR - fD) / (gamma_L fL), f = M / S per stage (DC1 on
//                 the noncomposite section, DC2 and DW on the long-term and
//                 LL + IM on the short-term composite section), gamma_D = 1.0;
//   Service III   prestressed concrete, bottom fibre in positive moment:
//                 RF = (fR - fD - fP) / (gamma_L fL), tension positive;
//   Service I     permits on reinforced concrete, tension steel stress on
//                 the cracked section, fR = 0.9 fy (MBE 6A.5.4.2.2b).
// Service limit states take no phi_c phi_s (C = fR, MBE 6A.4.2.1); their
// RatingFactorResult terms are stresses in Pa, not moments. LFR rates the
// strength limit state only (MBE 6B.4.1).
//
// Permits (LRFR): the load model must be named by one of the policy's permit
// types (lrfr.permit_types.<id>.load_models); the type sets gamma_LL by ADTT
// and loading ratio (gross weight over the front-to-rear axle length), its
// dynamic allowance, and whether the one-lane distribution factor is used
// with its multiple presence divided out (MBE 6A.4.5.4.2b).
//
// Live load per girder: LL + IM = g [ (1 + IM) * train + (1 + IM_lane) * lane ],
// the governing case being chosen after IM (the static governing case can
// differ). IM_lane is 0 for LRFR (LRFD 3.6.2.1) and the impact fraction I for
// LFR (Standard Specifications 3.8.2: impact on truck and lane loading).
//
// Units: internal SI (moments N*m, shears N, stresses Pa); rating factors
// dimensionless.
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
  // One-lane factors with their multiple presence, per point, for permits
  // rated with one lane (MBE 6A.4.5.4.2b); empty vectors = not available
  // (the multi-lane factors are then used, with a warning).
  GirderDistribution one_lane_distribution;
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
  std::string fibre;  // service: "top flange", "bottom flange", "bottom fibre", "tension steel"; "" for strength
  model::RatingLevel level = model::RatingLevel::inventory;
  RatingFactorResult result;
  Real capacity_factor = 1;  // phi_c phi_s (LRFR); 1 for LFR
  Real resistance = 0;       // phi Rn before phi_c phi_s, N*m or N; fR (Pa) for service limit states
  std::string resistance_article;
  Real distribution = 0;  // lanes per girder
  Real impact = 0;        // IM or I as a fraction
  Real gamma_ll = 0;      // or A2
  std::string case_id;    // the load case that governs after IM
};

// The live-load factor of one limit state and where it came from.
struct LimitStateFactor {
  LimitState limit_state = LimitState::strength_i;
  Real gamma_ll = 0;   // or A2
  std::string source;  // e.g. "policy lrfr.design.inventory (MBE Table 6A.4.2.2-1)"
};

struct LevelRating {
  model::RatingLevel level = model::RatingLevel::inventory;
  std::string factor_source;              // where the strength gamma_LL (or A2) came from
  std::vector<LimitStateFactor> factors;  // every limit state rated at this level
  std::vector<PointRating> points;        // every rated point, effect and limit state
  std::optional<PointRating> governing;   // the smallest rated RF over every limit state
};

struct LoadModelRating {
  std::string load_model_id;
  std::string name;
  model::VehicleCategory category = model::VehicleCategory::design;
  std::optional<Real> rating_weight;  // W, N
  std::string permit_type;            // permits: the policy's permit type id
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

// The limit states a load model of `category` is rated at, at `level`, on a
// girder of `material` by `method`, as the policy's service_checks switch
// them (MBE Table 6A.4.2.2-1; LFR: strength only). The strength state comes
// first. Service I for permits on prestressed concrete is not rated (a
// warning of rate_girder_line says so).
[[nodiscard]] std::vector<LimitState> rated_limit_states(model::RatingMethod method, model::MaterialKind material,
                                                         model::VehicleCategory category, model::RatingLevel level,
                                                         const model::ServiceChecks& checks);

// The loading ratio of a permit: the gross weight of its axle train over the
// front-to-rear length (spacings at their minimum), N/m (MBE 6A.4.5.4.2a).
// Nullopt for a lane-only model or a single axle.
[[nodiscard]] std::optional<Real> permit_loading_ratio(const model::LoadModel& model,
                                                       const model::VehicleLibrary& library);

// Throws InputError when a permit vehicle has no permit type in the policy,
// or the policy has no factor for a limit state asked for.
[[nodiscard]] GirderRating rate_girder_line(const GirderRatingInputs& inputs);

}  // namespace tenthpoint::rating
