// ChangeReport: what moved between two runs of a ledger, and
// compare_records(), the pure function that finds it. The ledger loads the
// two runs' records and calls it; tests call it on plain records.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/ledger/bridge_record.h"

namespace tenthpoint::ledger {

struct RatingChange {
  std::string structure_id;
  std::string load_model_id;
  std::string level;
  std::optional<double> before;  // none: not rated in the earlier run
  std::optional<double> after;   // none: not rated in the later run
};

struct ChangeReport {
  RunId from = 0;
  RunId to = 0;
  double threshold = 0;                   // |after - before| that counts as a move
  std::vector<RatingChange> moved;        // rating factors that moved beyond the threshold
  std::vector<std::string> newly_posted;  // structure ids whose recommendation became post
  std::vector<std::string> newly_closed;  // ... became close
  std::vector<BridgeRecord> overdue;      // rerate_by or post_by before the later run's date
};

// Rating factors closer than this to the threshold count as "at" it: factors
// are reported to two decimals, and a decimal difference equal to the
// threshold (0.85 - 0.80 against 0.05) lands a few ulps either side of it in
// binary, so without this allowance "exactly at the threshold" would count
// for some pairs and not for others.
inline constexpr double kThresholdAllowance = 1e-9;

// Compares the records of two runs, by structure id (records with an empty
// id, files that could not be read, are skipped):
//  - moved: per (bridge, load model, level), the lowest governing rating
//    factor of each run; listed when |after - before| exceeds `threshold`
//    (strictly: a move of exactly the threshold is not listed), or when the
//    rating is in one run only (a new bridge, a failed rating, a vehicle
//    added to or dropped from the set);
//  - newly_posted / newly_closed: the recommendation is "post" / "close" in
//    `after` and was something else in `before` (or the bridge was absent);
//  - overdue: records of `after` whose rerate_by or post_by (ISO dates) is
//    before `as_of` (the later run's start date, YYYY-MM-DD).
// Lists are sorted by structure id, then load model, then level.
[[nodiscard]] ChangeReport compare_records(const std::vector<BridgeRecord>& before,
                                           const std::vector<BridgeRecord>& after, double threshold,
                                           std::string_view as_of);

}  // namespace tenthpoint::ledger
