#include "engine/ledger/change_report.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <set>
#include <tuple>

namespace tenthpoint::ledger {
namespace {

using RatingKey = std::tuple<std::string, std::string, std::string>;  // structure id, load model, level

// The lowest rating factor per key: a record holds one governing row per load
// model and level, but should a caller give two, the lower one governs.
std::map<RatingKey, double> lowest_factors(const std::vector<BridgeRecord>& records) {
  std::map<RatingKey, double> out;
  for (const BridgeRecord& r : records) {
    if (r.structure_id.empty()) continue;
    for (const GoverningRow& g : r.governing) {
      const RatingKey key{r.structure_id, g.load_model_id, g.level};
      const auto [it, inserted] = out.emplace(key, g.rating_factor);
      if (!inserted) it->second = std::min(it->second, g.rating_factor);
    }
  }
  return out;
}

std::map<std::string, const BridgeRecord*> by_structure(const std::vector<BridgeRecord>& records) {
  std::map<std::string, const BridgeRecord*> out;
  for (const BridgeRecord& r : records)
    if (!r.structure_id.empty()) out.emplace(r.structure_id, &r);
  return out;
}

bool before_date(const std::optional<std::string>& date, std::string_view as_of) {
  // ISO 8601 dates compare as text in calendar order.
  return date && !date->empty() && std::string_view(*date) < as_of;
}

}  // namespace

ChangeReport compare_records(const std::vector<BridgeRecord>& before, const std::vector<BridgeRecord>& after,
                             double threshold, std::string_view as_of) {
  ChangeReport report;
  report.threshold = threshold;

  const auto old_factors = lowest_factors(before);
  const auto new_factors = lowest_factors(after);
  std::set<RatingKey> keys;
  for (const auto& [key, rf] : old_factors) keys.insert(key);
  for (const auto& [key, rf] : new_factors) keys.insert(key);
  for (const RatingKey& key : keys) {
    const auto o = old_factors.find(key);
    const auto n = new_factors.find(key);
    RatingChange change{std::get<0>(key), std::get<1>(key), std::get<2>(key), std::nullopt, std::nullopt};
    if (o != old_factors.end()) change.before = o->second;
    if (n != new_factors.end()) change.after = n->second;
    const bool both = change.before && change.after;
    if (!both || std::abs(*change.after - *change.before) - threshold > kThresholdAllowance)
      report.moved.push_back(std::move(change));
  }

  const auto old_records = by_structure(before);
  for (const auto& [id, record] : by_structure(after)) {
    const auto o = old_records.find(id);
    const std::string previous = o == old_records.end() ? std::string() : o->second->recommendation;
    if (record->recommendation == "post" && previous != "post") report.newly_posted.push_back(id);
    if (record->recommendation == "close" && previous != "close") report.newly_closed.push_back(id);
    if (before_date(record->rerate_by, as_of) || before_date(record->post_by, as_of)) report.overdue.push_back(*record);
  }
  return report;
}

}  // namespace tenthpoint::ledger
