#include "engine/pipeline/rating_summary.h"

#include <string>

namespace tenthpoint::pipeline {
namespace {

// Posting weights are in short tons (US) or tonnes-force (SI), the units of
// the posting signs; units::Quantity::weight_tons converts both.
Real in_posting_unit(Real weight, units::UnitSystem system) {
  return units::from_internal(weight, units::Quantity::weight_tons, system);
}

}  // namespace

std::string_view posting_unit_name(units::UnitSystem system) {
  return system == units::UnitSystem::us ? "ton" : "tonne";
}

ledger::BridgeRecord summarize_rating(const model::Bridge& bridge, const BridgeRating& rating) {
  const units::UnitSystem u = bridge.units;
  ledger::BridgeRecord r;
  r.structure_id = rating.bridge_id;
  r.name = bridge.identity.name;
  r.method = std::string(model::to_string(rating.method));
  r.policy_id = rating.policy_id;
  r.policy_version = rating.policy_version;
  r.edition = rating.edition;
  r.vehicle_set = rating.vehicle_set;
  r.rating_date = rating.rating_date.to_iso();
  if (rating.inspection_date) r.inspection_date = rating.inspection_date->to_iso();
  r.weight_unit = std::string(posting_unit_name(u));

  for (const GoverningRating& g : rating.governing) {
    ledger::GoverningRow row;
    row.load_model_id = g.load_model_id;
    row.name = g.name;
    row.category = std::string(model::to_string(g.category));
    row.level = std::string(model::to_string(g.level));
    row.rating_factor = g.at.result.rating_factor;
    if (g.rating_weight_rated) row.rating_weight = in_posting_unit(*g.rating_weight_rated, u);
    row.girder_id = g.girder_id;
    row.station = g.at.station;
    row.point = g.at.label;
    row.effect = std::string(rating::to_string(g.at.effect));
    row.limit_state = std::string(rating::to_string(g.at.limit_state));
    row.screened_out = g.screened_out;
    r.governing.push_back(std::move(row));
  }
  for (const VehiclePosting& p : rating.postings) {
    ledger::PostingRow row;
    row.load_model_id = p.load_model_id;
    row.rating_factor = p.rating_factor;
    row.status = std::string(rating::to_string(p.decision.status));
    if (p.decision.status == rating::PostingStatus::post)
      row.posted_weight = in_posting_unit(p.decision.posted_weight, u);
    row.reason = p.decision.reason;
    r.postings.push_back(std::move(row));
  }
  r.recommendation = std::string(rating::to_string(rating.recommendation));
  r.recommendation_reason = rating.recommendation_reason;
  if (rating.deadlines.rerate_by) r.rerate_by = rating.deadlines.rerate_by->to_iso();
  if (rating.deadlines.post_by) r.post_by = rating.deadlines.post_by->to_iso();
  r.warning_count = static_cast<int>(rating.warnings.size());
  return r;
}

}  // namespace tenthpoint::pipeline
