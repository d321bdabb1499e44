// BridgeRating: rating one bridge end to end, from the validated bridge
// record and its policy to governing rating factors, ratings in tons,
// screening, posting and deadlines. Pure: no files are read or written here
// (the caller reads the bridge and policy with engine/io).
//
// Steps, per girder line: the staged line-girder analysis (analysis), the
// per-lane moving-load envelopes of every load model of the bridge's vehicle
// set (live_load), the distribution factors (distribution), the capacities
// along the girder and the condition and system factors (capacity), and the
// rating factors at every analysis point (rating::rate_girder_line). Then,
// over the girder lines: the governing value per load model and level, the
// screening rules of the policy (MBE 6A.4.3), the posting of every legal load
// (MBE 6A.8.3) and the bridge's recommendation, and the deadlines.
//
// Failure: InputError (bad or missing data: a vehicle the set names but the
// library lacks, a capacity that cannot be computed anywhere, no condition
// rating for phi_c) and ModelError (a structure that cannot be analysed)
// propagate to the caller, which records the bridge as failed.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/calendar_date.h"
#include "engine/distribution/distribution_factor.h"
#include "engine/model/bridge.h"
#include "engine/model/policy.h"
#include "engine/pipeline/girder_line_detail.h"
#include "engine/rating/deadlines.h"
#include "engine/rating/girder_rating.h"
#include "engine/rating/posting.h"

namespace tenthpoint::pipeline {

// The governing rating of one load model at one level over every girder line.
struct GoverningRating {
  std::string load_model_id;
  std::string name;
  model::VehicleCategory category = model::VehicleCategory::design;
  model::RatingLevel level = model::RatingLevel::operating;
  std::optional<Real> rating_weight;  // W, N
  std::string girder_id;
  rating::PointRating at;                   // the governing point, effect and calculation
  std::optional<Real> rating_weight_rated;  // RF x W, N
  bool screened_out = false;                // not needed by the policy's screening rules
  std::string screening_reason;
};

struct VehiclePosting {
  std::string load_model_id;
  std::string name;
  Real rating_factor = 0;
  Real rating_weight = 0;  // W, N
  rating::PostingDecision decision;
};

struct BridgeRating {
  std::string bridge_id;
  model::RatingMethod method = model::RatingMethod::lrfr;
  std::string policy_id;
  std::string policy_version;
  std::string edition;
  std::string vehicle_set;
  CalendarDate rating_date;
  std::optional<CalendarDate> inspection_date;
  std::vector<rating::GirderRating> girders;
  std::vector<distribution::GirderLineFactors> distribution;  // per girder line
  std::vector<GoverningRating> governing;                     // per load model and level
  std::vector<std::string> screening;                         // the screening logic as applied, in words
  std::vector<VehiclePosting> postings;                       // legal loads (and emergency vehicles)
  rating::PostingStatus recommendation = rating::PostingStatus::none;
  std::string recommendation_reason;
  rating::RatingDeadlines deadlines;
  std::vector<std::string> warnings;
  // Per girder line (same order as `girders`): points, dead loads and
  // envelopes, for the results document (engine/report/results_document.h).
  std::vector<GirderLineDetail> details;

  // The governing rating of a load model at a level; nullptr when not rated.
  [[nodiscard]] const GoverningRating* find(std::string_view load_model_id, model::RatingLevel level) const;
};

[[nodiscard]] BridgeRating rate_bridge(const model::Bridge& bridge, const model::Policy& policy,
                                       CalendarDate rating_date);

// Whether the inspection in force recorded a change that reduces capacity
// against the record before it: a lower superstructure condition rating, or
// section loss it did not have (23 CFR 650.313 asks for a new rating then).
[[nodiscard]] bool inspection_reduced_capacity(const model::Bridge& bridge, std::optional<CalendarDate> as_of);

}  // namespace tenthpoint::pipeline
