// The run summary files: summary.csv and summary.json in a run's output
// directory, one row per bridge of the run (rated, unchanged or failed), for
// people (a spreadsheet) and for other systems (schemas/summary.schema.json).
//
// Each row: structure id, name, status and reason, method, policy, the
// governing design-load inventory and operating rating factors with their
// load model, the controlling legal-load rating factor and vehicle (see
// record_headline.h), the posting per vehicle class, the recommendation,
// the rating and inspection dates, the deadlines, the inputs hash and the
// bridge file.
//
// CSV layout, for a spreadsheet: one header row, then one row per bridge.
// Postings take two columns per vehicle class that any bridge of the run
// posts or rates for posting, in the order they first appear:
//   posting_<ID>_status        none, post or close ("" when not rated)
//   posting_<ID>_<unit>        the posted weight when the status is post
// where <unit> is "ton" (US short ton) or "tonne" (SI tonne-force). A run
// mixing US and SI bridges gets one weight column per unit present.
// Rating factors are written to three decimals (the JSON keeps full
// precision), so that a value just below 1.00 never reads as 1.00; weights
// to one decimal. Fields are quoted per RFC 4180 (engine/core/csv_field.h).
//
// Both files are written atomically (engine/core/atomic_file.h): a reader
// sees the old file or the new one. Throws std::runtime_error naming the
// file when it cannot be written; ModelError when a number is not finite.
#pragma once

#include <filesystem>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "engine/ledger/bridge_record.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::report {

inline constexpr const char* kSummaryFormat = "tenthpoint-summary";
inline constexpr int kSummaryFormatVersion = 1;

[[nodiscard]] std::string summary_csv(const std::vector<ledger::BridgeRecord>& records);
[[nodiscard]] nlohmann::json summary_json(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records);

// Writes <dir>/summary.csv and <dir>/summary.json.
void write_run_summary(const std::filesystem::path& dir, const ledger::RunInfo& run,
                       const std::vector<ledger::BridgeRecord>& records);

// The run as JSON (shared by the summary and the export documents).
[[nodiscard]] nlohmann::json run_json(const ledger::RunInfo& run);

}  // namespace tenthpoint::report
