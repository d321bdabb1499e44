// Live-load models for rating: axle trains (a truck's axles and spacings) and
// the load models built from them (HL-93, the AASHTO legal loads, the
// specialized hauling vehicles, emergency vehicles, HS20). A load model is a
// set of cases; its effect at a point is the worst case that applies there.
// Values are internal SI: forces N, lengths m, line loads N/m, rating
// weights N (a weight, not a mass: 1 ton = 2 kip, 1 t = 9.80665 kN).
//
// Axles run front to back; spacings[i] is between axle i and axle i + 1,
// centre to centre. A variable spacing (e.g. HL-93's 14 to 30 ft) takes the
// value in [min, max] that gives the extreme effect.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

// What a load model is for (MBE 6A.1.3 and 6A.4): design-load rating,
// legal-load rating and posting, the specialized hauling vehicles (SHVs,
// rated as legal loads), permits, emergency vehicles, and the LFR design
// load (HS20).
enum class VehicleCategory { design, legal, specialized_hauling, permit, emergency, lfr_design };

// The force effects a case may be limited to. HL-93's two-truck case, for
// example, applies to negative moment and interior-support reactions only.
enum class LoadEffect { positive_moment, negative_moment, shear, end_reaction, interior_reaction };

std::string_view to_string(VehicleCategory v);
std::string_view to_string(LoadEffect v);
template <>
std::optional<VehicleCategory> parse(std::string_view text);
template <>
std::optional<LoadEffect> parse(std::string_view text);

struct AxleSpacing {
  Real min = 0;  // m
  Real max = 0;  // m; == min for a fixed spacing

  [[nodiscard]] bool variable() const { return max > min; }
};

struct AxleTrain {
  std::string id;
  std::string name;
  std::vector<Real> axle_weights;     // N, front axle first
  std::vector<AxleSpacing> spacings;  // axle_weights.size() - 1 of them
  std::string source;                 // where the configuration comes from, e.g. "AASHTO LRFD 3.6.1.2.2"
  SourceLocation where;

  [[nodiscard]] Real gross_weight() const;  // N
  // Front to rear axle with every variable spacing at its minimum, m.
  [[nodiscard]] Real shortest_length() const;
};

// A uniform lane load, never increased by dynamic allowance (LRFD 3.6.1.2.4).
struct LaneLoad {
  Real intensity = 0;  // N/m over the loaded length
  Real factor = 1.0;   // e.g. 0.90 for HL-93's negative-moment case
};

// LFR lane loading's concentrated loads (AASHTO Standard Specifications
// 3.7.1.2): one load for moment, a heavier one for shear, and for negative
// moment in continuous spans a second load of the moment weight placed in
// another span.
struct LaneConcentratedLoads {
  Real moment = 0;  // N
  Real shear = 0;   // N
  bool second_load_for_negative_moment = false;
};

// Span lengths a case applies to, tested against the span in which the
// effect is evaluated (for a support effect, the longer adjacent span).
struct SpanCondition {
  std::optional<Real> longer_than;      // m, exclusive
  std::optional<Real> not_longer_than;  // m, inclusive
};

// One way of placing a load model on the bridge.
struct LoadCase {
  std::string id;
  std::optional<std::string> train;  // axle train id; absent for a lane-only case
  int count = 1;                     // trains in the lane (2 for the two-truck cases)
  Real train_factor = 1.0;           // multiplies every axle weight (0.90, 0.75)
  // Distance from the rear axle of one train to the front axle of the next
  // (count > 1), m. min == max fixes it; max is +infinity when unbounded (the
  // bridge length bounds it in practice).
  std::optional<AxleSpacing> gap;
  // Fixes every variable spacing of the train at this value for this case
  // (HL-93's two-truck case fixes the 32 kip axles 14 ft apart), m.
  std::optional<Real> fixed_variable_spacing;
  std::optional<LaneLoad> lane;
  std::optional<LaneConcentratedLoads> lane_concentrated;
  std::vector<LoadEffect> effects;  // empty = every effect
  // Negative moment only between the points of contraflexure under uniform
  // load on all spans (LRFD 3.6.1.3.1).
  bool between_contraflexure_points_only = false;
  SpanCondition spans;
  // Axles that would reduce the effect are left off (LRFD 3.6.1.3.1).
  bool drop_relieving_axles = false;
  SourceLocation where;

  [[nodiscard]] bool applies_to(LoadEffect effect) const;
};

struct LoadModel {
  std::string id;
  std::string name;
  VehicleCategory category = VehicleCategory::legal;
  std::vector<RatingMethod> methods;  // the methods it may be rated with
  // W, the weight a rating factor multiplies for a rating in tons and for
  // posting (MBE 6A.4.4.4, 6A.8.3), N. Absent for lane-only models.
  std::optional<Real> rating_weight;
  std::vector<LoadCase> cases;
  std::string source;
  SourceLocation where;

  [[nodiscard]] bool rated_with(RatingMethod method) const;
};

struct VehicleLibrary {
  std::string id;
  std::string name;
  std::string source_file;
  std::vector<AxleTrain> trains;
  std::vector<LoadModel> load_models;

  [[nodiscard]] const AxleTrain* find_train(std::string_view train_id) const;
  [[nodiscard]] const LoadModel* find_load_model(std::string_view model_id) const;
  // Adds `other`'s trains and models; an id already present is replaced.
  void merge(const VehicleLibrary& other);
};

}  // namespace tenthpoint::model
